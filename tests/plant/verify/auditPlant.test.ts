// The independent audit against hand calculations with IAPWS-IF97, and
// against solutions perturbed on purpose.
import { describe, expect, it } from 'vitest';
import { plantResult, solvePlant, type PlantOutcome } from '../../../src/plant/index.js';
import { auditPlant, solvedPlantFromReports, type IndependentAudit, type SolvedPlant } from '../../../src/plant/verify/index.js';
import type { Plant } from '../../../src/model/index.js';
import { saturatedLiquid, saturatedVapour, saturationTemperature, statePH, statePS, statePT } from '../../../src/properties/index.js';
import { expectClose } from '../../helpers/expectClose.js';
import { caseOpening } from '../../helpers/caseText.js';
import { loadPlant, smallCase } from '../helpers/cases.js';

type Solved = Extract<PlantOutcome, { ok: true }>;

async function solve(plant: Plant): Promise<Solved> {
  const outcome = await solvePlant(plant);
  if (!outcome.ok) throw new Error(`expected a solution, got: ${outcome.message}`);
  return outcome;
}

/** The solve's flows and header states, as the audit reads them. */
function solvedOf(outcome: Solved): SolvedPlant {
  const result = plantResult(outcome);
  return solvedPlantFromReports(result.headers, result.units);
}

const unitOf = (audit: IndependentAudit, id: string) => {
  const found = audit.units.find((unit) => unit.id === id);
  if (!found) throw new Error(`no audit of ${id}`);
  return found;
};
const checkOf = (audit: IndependentAudit, id: string, what: string) => {
  const found = unitOf(audit, id).checks.find((check) => check.what === what);
  if (!found) throw new Error(`no check "${what}" on ${id}`);
  return found;
};

const ATM = 0.101325; // MPa, the test plants' atmosphere
const PSI = 0.006894757293168; // MPa per psi
const KJ_KG_PER_BTU_LB = 2.326; // exact, by the definition of the IT Btu and the pound

/** A US-pressure plant: 600 psig at 825 degF, a turbine stage to 150 psig at 70 %. */
function turbinePlant(): Plant {
  return loadPlant(`${caseOpening({ name: 'Turbine audit' })}power:
  site_demand: 2 MW
  import: { price: 100 USD/MWh, max: 10 MW }
  export: { price: 0 USD/MWh, max: 0 MW }
headers:
  - { id: hp, pressure: 600 psig, state: controlled, temperature: 825 degF, venting: forbidden }
  - { id: mp, pressure: 150 psig, state: floating, venting: forbidden }
boilers:
  - id: b1
    header: hp
    fuels: [gas]
    steam: { min: 0 t/h, max: 50 t/h }
    outlet_temperature: 850 degF
    efficiency: 80 %
    blowdown: 0 %
turbines:
  - id: st1
    inlet: hp
    stages:
      - { to: mp, isentropic_efficiency: 70 %, section_flow: { min: 10 t/h, max: 10 t/h } }
    mechanical_efficiency: 98 %
    generator_efficiency: 96 %
letdowns:
  - { id: prv, from: hp, to: mp, capacity: 50 t/h, desuperheater: none }
users:
  - { id: u1, header: mp, steam: 10 t/h }
deaerator:
  pressure: 0.2 barg
  heating_steam: mp
  vent: 0 %
objective: minimum_cost
`);
}

describe('auditPlant: a turbine stage', () => {
  it('power = m eta (h1 - h2s) eta_m eta_g, with h1 - h2s as the theoretical steam rate gives it (MIL-HDBK-1003/7 Table 8)', async () => {
    const plant = turbinePlant();
    const outcome = await solve(plant);
    const audit = outcome.independentAudit;
    expect(audit.ok, audit.summary).toBe(true);
    // Hand calculation with IF97: inlet at 614.696 psia, 825 degF; isentropic to 164.696 psia.
    const p1 = ATM + 600 * PSI;
    const p2 = ATM + 150 * PSI;
    const inlet = statePT(p1, ((825 - 32) * 5) / 9 + 273.15);
    const isentropic = statePS(p2, inlet.s);
    const flow = 10 / 3.6;
    const drop = 0.7 * (inlet.h - isentropic.h);
    expectClose(checkOf(audit, 'st1', 'power').expected, flow * drop * 0.98 * 0.96, 1e-9, 'st1 power by hand');
    // MIL-HDBK-1003/7 Table 8: 600 psig 825 degF to 150 psig, 22.15 lb/kWh, so h1 - h2s = 3413 / 22.15 Btu/lb.
    // The handbook used older steam tables: agreement within 0.5 %.
    expectClose(inlet.h - isentropic.h, (3413 / 22.15) * KJ_KG_PER_BTU_LB, 5e-3, 'isentropic drop against the handbook');
    // Entropy generation of an adiabatic expansion: m (s2 - s1) > 0.
    const exhaust = statePH(p2, inlet.h - drop);
    expectClose(unitOf(audit, 'st1').entropy_generation_kW_K!, flow * (exhaust.s - inlet.s), 1e-9, 'st1 entropy generation');
    expect(unitOf(audit, 'st1').entropy_generation_kW_K!).toBeGreaterThan(0);
  });

  it('a perturbed power or header enthalpy fails the audit, naming the unit', async () => {
    const plant = turbinePlant();
    const solved = solvedOf(await solve(plant));
    expect(auditPlant(plant, solved).ok).toBe(true);
    const power = structuredClone(solved);
    power.turbines[0].power *= 1.001;
    const byPower = auditPlant(plant, power);
    expect(byPower.ok).toBe(false);
    expect(byPower.failures.map((line) => line.split(':')[0])).toEqual(['st1']);
    expect(byPower.summary).toMatch(/^the independent audit fails at unit st1: power: the audit gives [\d.]+ kW, the solve [\d.]+ kW/);
    const enthalpy = structuredClone(solved);
    enthalpy.headers.find((header) => header.id === 'mp')!.h += 2;
    const byEnthalpy = auditPlant(plant, enthalpy);
    expect(byEnthalpy.failures.map((line) => line.split(':')[0])).toContain('mp');
  });

  it('a Willans line steeper than the isentropic drop generates negative entropy and fails, naming the turbine', async () => {
    const plant = turbinePlant();
    const solved = solvedOf(await solve(plant));
    // Isentropic drop here is about 358 kJ/kg; a slope of 400 kJ/kg x 0.9408 asks for more work than isentropic.
    const impossible = structuredClone(plant);
    impossible.turbines[0].stages[0].performance = { kind: 'willans', slope: 400, intercept: 0 };
    solved.turbines[0].power = 400 * solved.turbines[0].sectionFlows[0];
    const audit = auditPlant(impossible, solved);
    expect(unitOf(audit, 'st1').entropy_generation_kW_K!).toBeLessThan(0);
    expect(audit.failures.find((line) => line.startsWith('st1:'))).toMatch(/entropy generation -[\d.e-]+ kW\/K is negative: the second law forbids it/);
  });
});

describe('auditPlant: a letdown with spray', () => {
  it('spray = m (h_in - h_out) / (h_out - h_w) and its entropy generation, from IF97 by hand', async () => {
    const plant = loadPlant(smallCase({ letdown: true }));
    const outcome = await solve(plant);
    const audit = outcome.independentAudit;
    expect(audit.ok, audit.summary).toBe(true);
    // 40 barg at 400 degC let down to 10 barg and sprayed to 220 degC with feedwater at 0.2 barg.
    const inlet = statePT(ATM + 4, 673.15);
    const target = statePT(ATM + 1, 493.15);
    const water = saturatedLiquid(ATM + 0.02);
    const solved = solvedOf(outcome);
    const steam = solved.letdowns[0].steam;
    const spray = (steam * (inlet.h - target.h)) / (target.h - water.h);
    expect(steam).toBeGreaterThan(1);
    expectClose(checkOf(audit, 'prv', 'spray water').expected, spray, 1e-9, 'spray by hand');
    expectClose(solved.letdowns[0].spray, spray, 1e-9, 'the solve sprays as much');
    const generation = (steam + spray) * target.s - steam * inlet.s - spray * water.s;
    expectClose(unitOf(audit, 'prv').entropy_generation_kW_K!, generation, 1e-9, 'prv entropy generation');
    expect(generation).toBeGreaterThan(0);
    // One per cent more spray than the energy balance allows fails, naming the letdown.
    const perturbed = structuredClone(solved);
    perturbed.letdowns[0].spray *= 1.01;
    perturbed.letdowns[0].outlet = perturbed.letdowns[0].steam + perturbed.letdowns[0].spray;
    const failed = auditPlant(plant, perturbed);
    expect(failed.failures.find((line) => line.startsWith('prv:'))).toMatch(/spray water/);
  });
});

describe('auditPlant: a flash tank', () => {
  it('x = (h_f(150 psig) - h_f(30 psig)) / h_fg(30 psig), 10.3 % (US DOE Steam Tip Sheet #12), balances and entropy by hand', async () => {
    // Blowdown is saturated drum water at 150 psig; all of it goes to a 30 psig flash tank.
    const text = smallCase()
      .replace('pressure: 10 barg', 'pressure: 150 psig')
      .replace('blowdown: 0 %', 'blowdown: 5 %\n    blowdown_to: flash')
      .replace('deaerator:\n', 'flash_tanks:\n  - { id: flash, pressure: 30 psig, vapour_to: low, liquid_to: drain }\ndeaerator:\n')
      .replace('headers:\n', 'headers:\n  - { id: low, pressure: 30 psig, state: floating, venting: allowed }\n');
    const plant = loadPlant(text);
    const outcome = await solve(plant);
    const audit = outcome.independentAudit;
    expect(audit.ok, audit.summary).toBe(true);
    const high = saturatedLiquid(ATM + 150 * PSI);
    const liquid = saturatedLiquid(ATM + 30 * PSI);
    const vapour = saturatedVapour(ATM + 30 * PSI);
    const fraction = (high.h - liquid.h) / (vapour.h - liquid.h);
    // The tip sheet prints one decimal from older steam tables: +-0.1 point.
    expect(Math.abs(fraction * 100 - 10.3)).toBeLessThan(0.1);
    const solved = solvedOf(outcome);
    const blowdown = (solved.boilers[0].steam * 0.05) / 0.95;
    expectClose(solved.flashTanks[0].vapour, fraction * blowdown, 1e-6, 'flash vapour');
    const tank = unitOf(audit, 'flash');
    expect(tank.energy_relative!).toBeLessThan(1e-6);
    const generation = fraction * blowdown * vapour.s + (1 - fraction) * blowdown * liquid.s - blowdown * high.s;
    expectClose(tank.entropy_generation_kW_K!, generation, 1e-5, 'flash entropy generation');
    expect(generation).toBeGreaterThan(0);
    const perturbed = structuredClone(solved);
    perturbed.flashTanks[0].vapour *= 1.01;
    perturbed.flashTanks[0].liquid -= perturbed.flashTanks[0].vapour / 101;
    expect(auditPlant(plant, perturbed).failures.map((line) => line.split(':')[0])).toContain('flash');
  });
});

describe('auditPlant: the deaerator', () => {
  it('heating steam D = (U h_f - M h_mk - C h_c) / (h_s - h_f) by hand; more steam fails, naming the deaerator', async () => {
    // One boiler makes saturated 10 barg steam for a 20 t/h user returning 60 % at 90 degC
    // and for the deaerator at 0.2 barg; makeup at 15 degC; no vent, no blowdown.
    const plant = loadPlant(smallCase({ returnPercent: 60 }));
    const outcome = await solve(plant);
    const audit = outcome.independentAudit;
    expect(audit.ok, audit.summary).toBe(true);
    const user = 20 / 3.6;
    const returned = 0.6 * user;
    const makeup = user - returned;
    const steam = saturatedVapour(ATM + 1);
    const feed = saturatedLiquid(ATM + 0.02);
    const condensate = statePT(ATM + 1, 363.15);
    const fresh = statePT(ATM, 288.15);
    const heating = (user * feed.h - makeup * fresh.h - returned * condensate.h) / (steam.h - feed.h);
    const solved = solvedOf(outcome);
    expectClose(solved.deaerator.heatingSteam, heating, 1e-6, 'heating steam');
    expectClose(solved.deaerator.makeup, makeup, 1e-6, 'makeup');
    const deaerator = unitOf(audit, 'deaerator');
    expect(deaerator.energy_relative!).toBeLessThan(1e-9);
    const generation = (user + heating) * feed.s - heating * steam.s - makeup * fresh.s - returned * condensate.s;
    expectClose(deaerator.entropy_generation_kW_K!, generation, 1e-6, 'deaerator entropy generation');
    const perturbed = structuredClone(solved);
    perturbed.deaerator.heatingSteam *= 1.005;
    expect(auditPlant(plant, perturbed).failures.map((line) => line.split(':')[0])).toContain('deaerator');
  });
});

describe('auditPlant: round-off at a unit that is off', () => {
  it('a stopped boiler carrying the solver\'s round-off passes; the same boiler with a real flow and no fuel fails', async () => {
    const { loadCase } = await import('../../../src/model/index.js');
    const loaded = await loadCase('cases/kestrel-bay-board-mill.yaml');
    if (!loaded.ok) throw new Error('the mill should load');
    const solved = solvedOf(await solve(loaded.plant));
    const stopped = solved.boilers.find((boiler) => !boiler.running && boiler.steam === 0);
    if (!stopped) throw new Error('the mill should leave a boiler off');
    expect(auditPlant(loaded.plant, solved).ok).toBe(true);
    // Seen after a warm-started solve: -4e-13 kg/s, inside HiGHS's feasibility tolerance.
    const noise = structuredClone(solved);
    noise.boilers.find((boiler) => boiler.id === stopped.id)!.steam = -4.073e-13;
    const withNoise = auditPlant(loaded.plant, noise);
    expect(withNoise.failures).toEqual([]);
    // A thousandth of a kilogram a second with no fuel is not round-off.
    const real = structuredClone(solved);
    real.boilers.find((boiler) => boiler.id === stopped.id)!.steam = 1e-3;
    expect(auditPlant(loaded.plant, real).failures.map((line) => line.split(':')[0])).toContain(stopped.id);
  });
});
