// A published utility-system LP: the boiler and turbo-generator plant of
// Edgar, Himmelblau & Lasdon, Optimization of Chemical Processes (2nd ed.,
// McGraw-Hill 2001), Example 11.4: two extraction turbines between 635, 195
// and 62 psig headers, purchased power with a demand penalty. Data and the
// optimum ($1,268.75/h, Table E11.4E) as printed there; the model uses the
// book's own fixed enthalpies (Btu/lb), so it is an LP as written.
// The book's dual table is not at hand, so the shadow prices are derived by
// hand from the optimal basis below and checked a second way by re-solving.
import { describe, expect, it } from 'vitest';
import { LinearModel, expr, getBackend, type BackendName } from '../../src/lp/index.js';

interface Demands {
  mediumSteam: number;
  lowSteam: number;
  power: number;
}

const BOOK: Demands = { mediumSteam: 271_536, lowSteam: 100_623, power: 24_550 };

function boilerTurbogenerator(demands: Demands = BOOK): LinearModel {
  const model = new LinearModel('edgar-himmelblau-11.4');
  const v = (name: string, upper = Infinity): ReturnType<LinearModel['addVariable']> => model.addVariable(name, { upper });
  // Table 11.4A: turbine 1 inlet at most 192,000 lb/h, condensate 62,000, internal flow 132,000;
  // turbine 2 inlet at most 244,000 lb/h and its 62 psig exhaust 142,000.
  const I1 = v('I1', 192_000);
  const I2 = v('I2', 244_000);
  const HE1 = v('HE1');
  const HE2 = v('HE2');
  const LE1 = v('LE1');
  const LE2 = v('LE2', 142_000);
  const C = v('C', 62_000);
  const BF1 = v('BF1');
  const BF2 = v('BF2');
  const HPS = v('HPS');
  const MPS = v('MPS');
  const LPS = v('LPS');
  const P1 = model.addVariable('P1', { lower: 2_500, upper: 6_250 });
  const P2 = model.addVariable('P2', { lower: 3_000, upper: 9_000 });
  const PP = v('PP');
  const EP = v('EP');
  model.addRow('t1.internal', expr().add(I1).add(HE1, -1), '<=', 132_000);
  model.addRow('hp.mass', expr().add(HPS).add(I1, -1).add(I2, -1).add(BF1, -1), '=', 0);
  model.addRow('site.mass', expr().add(I1).add(I2).add(BF1).add(C, -1).add(MPS, -1).add(LPS, -1), '=', 0);
  model.addRow('t1.mass', expr().add(I1).add(HE1, -1).add(LE1, -1).add(C, -1), '=', 0);
  model.addRow('t2.mass', expr().add(I2).add(HE2, -1).add(LE2, -1), '=', 0);
  model.addRow('mp.mass', expr().add(HE1).add(HE2).add(BF1).add(BF2, -1).add(MPS, -1), '=', 0);
  model.addRow('lp.mass', expr().add(LE1).add(LE2).add(BF2).add(LPS, -1), '=', 0);
  model.addRow('power.base', expr().add(EP).add(PP), '>=', 12_000);
  model.addRow('mp.demand', expr().add(MPS), '>=', demands.mediumSteam);
  model.addRow('lp.demand', expr().add(LPS), '>=', demands.lowSteam);
  model.addRow('power.demand', expr().add(P1).add(P2).add(PP), '>=', demands.power);
  // Turbine energy balances, Btu/h, with 3,413 Btu per kWh.
  model.addRow('t1.energy', expr().add(I1, 1359.8).add(HE1, -1267.8).add(LE1, -1251.4).add(C, -192).add(P1, -3413), '=', 0);
  model.addRow('t2.energy', expr().add(I2, 1359.8).add(HE2, -1267.8).add(LE2, -1251.4).add(P2, -3413), '=', 0);
  model.setObjective('minimize', expr().add(HPS, 0.00261).add(PP, 0.0239).add(EP, 0.00983));
  return model;
}

for (const backendName of ['highs', 'jslp'] as BackendName[]) {
  describe(`Edgar, Himmelblau & Lasdon Example 11.4 on ${backendName}`, () => {
    const backend = getBackend(backendName);
    it('reaches the published optimum of 1,268.75 $/h at the published point (Table E11.4E)', async () => {
      const result = await backend.solve(boilerTurbogenerator());
      expect(result.status).toBe('optimal');
      // The book prints the objective to the cent and flows to the lb/h.
      expect(Math.abs(result.objective! - 1268.75)).toBeLessThan(0.01);
      const published: Record<string, number> = { I1: 136_329, I2: 244_000, HE1: 128_158, HE2: 143_377, LE1: 0, LE2: 100_623, C: 8_170, BF1: 0, BF2: 0, HPS: 380_329, MPS: 271_536, LPS: 100_623, P1: 6_250, P2: 7_061, PP: 11_239, EP: 761 };
      for (const [name, value] of Object.entries(published)) expect(Math.abs(result.value(name) - value), name).toBeLessThan(1.5);
    });
  });
}

describe('Example 11.4 shadow prices', () => {
  const highs = getBackend('highs');
  // By hand from the optimal basis (P1 at 6,250 kW and I2 at 244,000 lb/h, LE1 = BF1 = BF2 = 0):
  // - one more lb/h of 195 psig steam comes through turbine 1 at fixed power: I1 = HE1 + C and
  //   92 HE1 + 1167.8 C fixed, so dI1 = 1 - 92/1167.8 and the cost is 0.00261 x 0.921219 $/h;
  // - a kWh more is bought, and the base-power row binds, so it costs 0.0239 - 0.00983 $;
  // - one more lb/h of 62 psig steam shifts turbine 2 from 195 to 62 psig exhaust, which turbine 1
  //   makes up at the 195 psig price, and gains (1267.8 - 1251.4)/3413 kWh.
  const mediumSteam = 0.00261 * (1 - 92 / 1167.8);
  const power = 0.0239 - 0.00983;
  const lowSteam = mediumSteam - ((1267.8 - 1251.4) / 3413) * power;

  it('equal the hand derivation from the optimal basis', async () => {
    const result = await highs.solve(boilerTurbogenerator());
    expect(Math.abs(result.shadowPrice('mp.demand') - mediumSteam)).toBeLessThan(1e-9);
    expect(Math.abs(result.shadowPrice('lp.demand') - lowSteam)).toBeLessThan(1e-9);
    expect(Math.abs(result.shadowPrice('power.demand') - power)).toBeLessThan(1e-9);
  });

  it('equal the change of the optimum when each demand is raised a little and solved again', async () => {
    const base = (await highs.solve(boilerTurbogenerator())).objective!;
    const step = 100;
    const raised = async (demands: Demands): Promise<number> => ((await highs.solve(boilerTurbogenerator(demands))).objective! - base) / step;
    expect(Math.abs((await raised({ ...BOOK, mediumSteam: BOOK.mediumSteam + step })) - mediumSteam)).toBeLessThan(1e-9);
    expect(Math.abs((await raised({ ...BOOK, lowSteam: BOOK.lowSteam + step })) - lowSteam)).toBeLessThan(1e-9);
    expect(Math.abs((await raised({ ...BOOK, power: BOOK.power + step })) - power)).toBeLessThan(1e-9);
  });
});
