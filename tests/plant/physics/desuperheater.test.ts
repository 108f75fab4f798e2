import { describe, expect, it } from 'vitest';
import { sprayWaterRatio } from '../../../src/plant/physics/desuperheater.js';
import { statePT } from '../../../src/properties/index.js';

describe('sprayWaterRatio(h_in, h_out, h_w)', () => {
  it('closes the energy balance of the mixing: m_in h_in + m_w h_w = (m_in + m_w) h_out', () => {
    // 42 bar a, 400 degC let down to 11 bar a and cooled to 200 degC with 105 degC feedwater.
    const inlet = statePT(4.2, 673.15).h;
    const target = statePT(1.1, 473.15).h;
    const water = statePT(1.1, 378.15).h;
    const ratio = sprayWaterRatio(inlet, target, water);
    expect(inlet + ratio * water).toBeCloseTo((1 + ratio) * target, 9);
    // By hand with IF97 values: (3213.5 - 2817.4) / (2817.4 - 440.3) is about 0.167.
    expect(ratio).toBeGreaterThan(0.16);
    expect(ratio).toBeLessThan(0.175);
  });

  it('needs no water when the steam is already at the target', () => {
    expect(sprayWaterRatio(2800, 2900, 400)).toBe(0);
  });
});
