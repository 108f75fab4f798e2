// A steam import given by its enthalpy: wet steam bought in, solved and audited.
import { describe, expect, it } from 'vitest';
import { loadCaseText, formatIssue } from '../../src/model/index.js';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { saturatedLiquid, saturatedVapour } from '../../src/properties/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { loadPlant, smallCase } from './helpers/cases.js';

const importing = (enthalpy: string): string =>
  smallCase({ boilerMax: '5 t/h', extra: `steam_imports:\n  - { id: neighbour, header: main, price: 20 USD/t, max: 30 t/h, enthalpy: ${enthalpy} }\n` });

describe('a steam import by enthalpy', () => {
  it('wet steam at 2700 kJ/kg into a 10 barg header: x from IF97, the import used, the independent audit passes', async () => {
    const plant = loadPlant(importing('2700 kJ/kg'));
    const supply = plant.steamImports[0];
    expect(supply.byEnthalpy).toBe(true);
    expect(supply.delivered.h).toBe(2700);
    const p = 0.101325 + 1;
    // By hand: x = (h - h_f) / (h_g - h_f) at 1.101325 MPa, between 0.9 and 1.
    const x = (2700 - saturatedLiquid(p).h) / (saturatedVapour(p).h - saturatedLiquid(p).h);
    expect(x).toBeGreaterThan(0.9);
    expect(x).toBeLessThan(1);
    const outcome = await solvePlant(plant);
    if (!outcome.ok) throw new Error(outcome.message);
    expect(outcome.independentAudit.ok, outcome.independentAudit.summary).toBe(true);
    const main = plantResult(outcome).headers.find((header) => header.id === 'main')!;
    expect(main.quality!).toBeLessThan(1);
    expect(Number(plantResult(outcome).units.find((unit) => unit.id === 'neighbour')!.values.steam_kg_s)).toBeGreaterThan(0);
    expectClose(supply.delivered.T, saturatedVapour(p).T, 1e-9, 'wet steam sits at saturation');
  });

  it('an enthalpy of liquid water is refused, located', () => {
    const result = loadCaseText(importing('500 kJ/kg'), 'import.yaml');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.issues.map((issue) => formatIssue(issue, 'import.yaml')).join('\n')).toMatch(/steam_imports\[0\]\.enthalpy {2}delivered enthalpy 500 kJ\/kg is liquid water at 10\.00 barg/);
  });

  it('temperature and enthalpy together are refused by the schema', () => {
    const result = loadCaseText(importing('2900 kJ/kg, temperature: 250 degC'), 'import.yaml');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.issues.map((issue) => issue.message).join('\n')).toContain('a steam import needs a temperature or an enthalpy, one of the two');
  });
});
