import { describe, expect, it } from 'vitest';
import Ajv2020 from 'ajv/dist/2020.js';
import { readFileSync } from 'node:fs';
import { explainVents, plantResult, solvePlant, type PlantResult, type VentExplanation } from '../../src/plant/index.js';
import { saturatedLiquid, saturatedVapour, statePT } from '../../src/properties/index.js';
import { caseOpening } from '../helpers/caseText.js';
import { expectClose } from '../helpers/expectClose.js';
import { loadPlant } from './helpers/cases.js';
import { ventingCase } from './helpers/ventingCase.js';

async function solvedResult(text: string): Promise<PlantResult> {
  const outcome = await solvePlant(loadPlant(text));
  if (!outcome.ok) throw new Error(`expected a solution, got: ${outcome.message}`);
  return plantResult(outcome);
}

const ventAt = (result: PlantResult, where: string): VentExplanation => {
  const found = result.vents.find((vent) => vent.where === where);
  if (!found) throw new Error(`no vent explained at ${where}: ${JSON.stringify(result.vents)}`);
  return found;
};

describe('explainVents: a header that must vent', () => {
  it('names the turbine at its minimum and the waste-heat boiler, and adds up to the vent', async () => {
    // The turbine must pass 30 t/h into LP and the waste-heat boiler adds 4 t/h; the
    // dryer takes 5 t/h and the deaerator a few, so LP vents the rest.
    const result = await solvedResult(ventingCase({ turbineMin: '30 t/h', lpUser: '5 t/h', wasteHeat: '4 t/h' }));
    const lp = result.headers.find((header) => header.id === 'lp')!;
    expect(lp.vent_kg_s).toBeGreaterThan(5);
    const vent = ventAt(result, 'lp');
    expect(vent.kind).toBe('header');
    expect(vent.flow_kg_s).toBeCloseTo(lp.vent_kg_s, 9);
    const turbine = vent.inflows.find((inflow) => inflow.from === 'bpt1')!;
    expect(turbine.held).toBe('inlet flow at minimum');
    expect(turbine.flow_kg_s * 3.6).toBeCloseTo(30, 6);
    const wasteHeat = vent.inflows.find((inflow) => inflow.from === 'hrsg1')!;
    expect(wasteHeat.held).toBe('unfired steam fixed by its process');
    // What comes in less what the outlets take is what is vented (the header's mass balance).
    const inflow = vent.inflows.reduce((total, item) => total + item.flow_kg_s, 0);
    const taken = vent.outlets.reduce((total, item) => total + item.flow_kg_s, 0);
    expect(inflow - taken).toBeCloseTo(vent.flow_kg_s, 6);
    expect(vent.outlets.map((outlet) => outlet.what).sort()).toEqual(['deaerator', 'users']);
    expect(vent.reason).toMatch(/^lp: \d+\.?\d* t\/h more steam than its users \(5\.00 t\/h\) and the deaerator \([\d.]+ t\/h\) take; /);
    expect(vent.reason).toContain("bpt1's exhaust (30.0 t/h, inlet flow at minimum)");
    expect(vent.reason).toContain("hrsg1's waste-heat steam (4.00 t/h, unfired steam fixed by its process)");
    expect(vent.reason).toMatch(/nothing takes steam from lp to a lower pressure\.$/);
    // No other vent here: the deaerator takes heating steam, it does not vent above its share.
    expect(result.vents.map((item) => item.where)).toEqual(['lp']);
  });

  it("names a controlled header's spray among the inflows that cannot be turned down", async () => {
    // LP held at 170 degC: the turbine's hotter exhaust is sprayed with feedwater, and
    // the spray's mass joins what LP must shed.
    const result = await solvedResult(ventingCase({ turbineMin: '30 t/h', lpUser: '5 t/h', wasteHeat: '4 t/h', lpControlled: true }));
    const spray = Number(result.units.find((unit) => unit.id === 'lp')!.values.spray_kg_s);
    expect(spray).toBeGreaterThan(0.01);
    const vent = ventAt(result, 'lp');
    const sprayInflow = vent.inflows.find((inflow) => inflow.what === 'spray water')!;
    expect(sprayInflow.flow_kg_s).toBeCloseTo(spray, 9);
    expect(sprayInflow.held).toBe('holding lp at its set temperature');
    expect(vent.reason).toMatch(/lp's spray water \([\d.]+ t\/h, holding lp at its set temperature\)/);
    expect(vent.inflows.find((inflow) => inflow.from === 'bpt1')?.held).toBe('inlet flow at minimum');
  });

  it('is valid against schema/result.schema.json, vents and all', async () => {
    const result = await solvedResult(ventingCase({ turbineMin: '30 t/h', lpUser: '5 t/h', wasteHeat: '4 t/h', lpControlled: true }));
    expect(result.vents.length).toBeGreaterThan(0);
    const ajv = new Ajv2020.default({ allErrors: true, strict: false });
    const validate = ajv.compile(JSON.parse(readFileSync('schema/result.schema.json', 'utf8')));
    validate(JSON.parse(JSON.stringify(result)));
    expect(validate.errors ?? []).toEqual([]);
    // The schema does describe the vents: a vent without its reason is refused.
    const broken = JSON.parse(JSON.stringify(result));
    delete broken.vents[0].reason;
    expect(validate(broken)).toBe(false);
  });

  it('writes the flows in the case units', async () => {
    const result = await solvedResult(ventingCase({ turbineMin: '30 t/h', lpUser: '5 t/h', wasteHeat: '4 t/h', units: 'us' }));
    // 30 t/h = 66.1 klb/h
    expect(ventAt(result, 'lp').reason).toContain("bpt1's exhaust (66.1 klb/h, inlet flow at minimum)");
  });

  it('explains nothing where nothing is vented', async () => {
    const result = await solvedResult(ventingCase({ turbineMin: '10 t/h', lpUser: '30 t/h', wasteHeat: '4 t/h' }));
    expect(result.totals.vented_kg_s).toBeLessThan(1e-6);
    expect(result.vents).toEqual([]);
  });
});

describe('explainVents: surplus let down from a header that may not vent', () => {
  // HP may not vent and is held at 380 degC; its waste-heat boiler makes 30 t/h at
  // 420 degC, sprayed down with feedwater, for a user of 10 t/h. The rest must go
  // down the letdown to LP, whose user takes 5 t/h, and LP vents what is left.
  const text = `${caseOpening({ name: 'Let down and vented' })}power:
  site_demand: 0 kW
  import: { price: 100 USD/MWh, max: 10 MW }
  export: { price: 0 USD/MWh, max: 0 MW }
headers:
  - id: hp
    pressure: 40 barg
    state: controlled
    temperature: 380 degC
    venting: forbidden
  - { id: lp, pressure: 4 barg, state: floating, venting: allowed }
boilers:
  - id: b1
    header: hp
    fuels: [gas]
    steam: { min: 0 t/h, max: 50 t/h }
    outlet_temperature: 420 degC
    efficiency: [{ load: 100 %, efficiency: 85 % }]
    blowdown: 0 %
    can_switch_off: false
heat_recovery_boilers:
  - { id: hrsg_hp, header: hp, steam: 30 t/h, outlet_temperature: 420 degC, blowdown: 0 % }
letdowns:
  - { id: prv, from: hp, to: lp, capacity: 60 t/h, desuperheater: none }
users:
  - { id: reactor, header: hp, steam: 10 t/h, condensate: { return: 0 % } }
  - { id: dryer, header: lp, steam: 5 t/h, condensate: { return: 0 % } }
deaerator:
  pressure: 0.2 barg
  heating_steam: lp
  vent: 0 %
objective: minimum_cost
`;

  it("names the letdown and, one level up, HP's waste-heat steam and spray", async () => {
    const result = await solvedResult(text);
    const vent = ventAt(result, 'lp');
    const letdown = vent.inflows.find((inflow) => inflow.from === 'prv')!;
    expect(letdown).toMatchObject({ what: 'letdown', upstream: 'hp', held: 'hp may not vent its own surplus' });
    expect(vent.reason).toContain('letdown prv from hp (');
    expect(vent.reason).toMatch(/; at hp, hp's spray water \([\d.]+ t\/h, holding hp at its set temperature\) and hrsg_hp's waste-heat steam \(30\.0 t\/h, unfired steam fixed by its process\) cannot be turned down either; /);
  });
});

describe('explainVents: the deaerator above its design share', () => {
  // One header; a user returns all its condensate at 160 degC, hotter than the
  // deaerator's saturation at 0.2 barg (about 105 degC). The feedwater cannot take
  // that heat, so the deaerator flashes the surplus to its vent.
  const text = `${caseOpening({ name: 'Hot returns' })}power:
  site_demand: 0 kW
  import: { price: 100 USD/MWh, max: 10 MW }
  export: { price: 0 USD/MWh, max: 0 MW }
headers:
  - { id: main, pressure: 10 barg, state: floating, venting: forbidden }
boilers:
  - id: b1
    header: main
    fuels: [gas]
    steam: { min: 0 t/h, max: 50 t/h }
    outlet_temperature: saturated
    efficiency: [{ load: 100 %, efficiency: 80 % }]
    blowdown: 0 %
    can_switch_off: false
users:
  - { id: press, header: main, steam: 20 t/h, condensate: { return: 90 %, temperature: 160 degC, to: deaerator } }
deaerator:
  pressure: 0.2 barg
  heating_steam: main
  vent: 0 %
objective: minimum_cost
`;

  it('names the hot return, draws no heating steam and gives the excess flow', async () => {
    const result = await solvedResult(text);
    const deaerator = result.units.find((unit) => unit.id === 'deaerator')!;
    const excess = Number(deaerator.values.excess_vent_kg_s);
    // By hand, with F the feedwater (the user's 20 t/h), R the return and v the vent:
    // R h_r + (F + v - R) h_makeup = F h_f + v h_g, so
    // v = (R (h_r - h_makeup) - F (h_f - h_makeup)) / (h_g - h_makeup), IF97 states.
    const F = 20 / 3.6;
    const R = 0.9 * F;
    const returned = statePT(1.101325, 433.15).h;
    const makeup = statePT(0.101325, 288.15).h;
    const byHand = (R * (returned - makeup) - F * (saturatedLiquid(0.121325).h - makeup)) / (saturatedVapour(0.121325).h - makeup);
    expectClose(excess, byHand, 1e-6, 'excess vent');
    expect(Number(deaerator.values.heating_steam_kg_s)).toBeLessThan(1e-6);
    const vent = ventAt(result, 'deaerator');
    expect(vent.kind).toBe('deaerator excess');
    expect(vent.flow_kg_s).toBeCloseTo(excess, 9);
    expect(vent.inflows.map((inflow) => inflow.from)).toEqual(['press']);
    expect(vent.reason).toMatch(/^deaerator: 1\.33 t\/h vented above its design share: press's condensate \(18\.0 t\/h at 160 degC\) comes back hotter than the feedwater \(105 degC\)/);
    expect(vent.reason).toMatch(/with no heating steam drawn\.$/);
  });
});

describe('explainVents on hand-made data', () => {
  it('says a letdown from a header that may not vent carries its surplus, and that a closed letdown below leads to a header that vents too', () => {
    const stream = (from: string, to: string, kind: string, mass: number) => ({ from, to, kind, mass_kg_s: mass, h_kJ_kg: 2800, T_K: 450 });
    const vents = explainVents(
      {
        headers: [
          { id: 'hp', vent_kg_s: 0 },
          { id: 'mp', vent_kg_s: 2 },
          { id: 'lp', vent_kg_s: 1 },
        ],
        streams: [
          stream('hrsg', 'hp', 'steam', 10),
          stream('hp', 'prv1', 'letdown', 10),
          stream('prv1', 'mp', 'letdown', 10),
          stream('mp', 'u1', 'process', 8),
          stream('mp', 'atmosphere', 'vent', 2),
          stream('mp', 'prv2', 'letdown', 0),
          stream('prv2', 'lp', 'letdown', 0),
          stream('ft', 'lp', 'flashVapour', 1),
          stream('lp', 'atmosphere', 'vent', 1),
        ],
        units: [
          { id: 'hrsg', kind: 'heatRecoveryBoiler', values: { fired_steam_kg_s: 0 }, binding: ['unfired steam fixed by its process'] },
          { id: 'prv1', kind: 'letdown', values: { spray_kg_s: 0 }, binding: [] },
          { id: 'prv2', kind: 'letdown', values: { spray_kg_s: 0 }, binding: [] },
          { id: 'ft', kind: 'flashTank', values: {}, binding: [] },
        ],
      },
      { flow: (kg_s) => `${kg_s.toFixed(1)} kg/s`, temperature: (K) => `${K} K` },
    );
    expect(vents.map((vent) => vent.where)).toEqual(['mp', 'lp']);
    expect(vents[0].reason).toBe(
      "mp: 2.0 kg/s more steam than its users (8.0 kg/s) take; letdown prv1 from hp (10.0 kg/s, hp may not vent its own surplus) cannot be turned down; at hp, hrsg's waste-heat steam (10.0 kg/s, unfired steam fixed by its process) cannot be turned down either; letdown prv2 to lp is closed, and lp vents too.",
    );
    expect(vents[1].reason).toBe('lp: 1.0 kg/s comes in and nothing draws on it; flash vapour from ft (1.0 kg/s, flashed from hot condensate or blowdown) cannot be turned down; nothing takes steam from lp to a lower pressure.');
  });
  it('says a header that may not vent sheds its surplus through the deaerator, and what holds it', () => {
    const stream = (from: string, to: string, kind: string, mass: number, h = 2800) => ({ from, to, kind, mass_kg_s: mass, h_kJ_kg: h, T_K: 450 });
    const vents = explainVents(
      {
        headers: [{ id: 'main', vent_kg_s: 0 }],
        streams: [
          stream('b1', 'main', 'steam', 10),
          stream('main', 'u1', 'process', 7),
          stream('main', 'deaerator', 'heatingSteam', 3),
          stream('deaerator', 'b1', 'feedwater', 10, 440),
          stream('makeup', 'deaerator', 'makeup', 8, 63),
          stream('deaerator', 'atmosphere', 'vent', 1, 2680),
        ],
        units: [
          { id: 'b1', kind: 'boiler', values: { steam_kg_s: 10 }, binding: ['at minimum steam'] },
          { id: 'deaerator', kind: 'deaerator', values: { excess_vent_kg_s: 1, heating_steam_kg_s: 3 }, binding: [] },
        ],
      },
      { flow: (kg_s) => `${kg_s.toFixed(1)} kg/s`, temperature: (K) => `${K} K` },
    );
    expect(vents.map((vent) => [vent.where, vent.kind])).toEqual([['deaerator', 'deaerator excess']]);
    expect(vents[0].reason).toBe(
      "deaerator: 1.0 kg/s vented above its design share: it draws 3.0 kg/s of heating steam from main, which may not vent, so main's surplus leaves here, where b1's steam (10.0 kg/s, at minimum steam) cannot be turned down.",
    );
  });
});
