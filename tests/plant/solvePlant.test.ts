import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readdirSync, readFileSync } from 'node:fs';
import { jslpBackend } from '../../src/lp/index.js';
import { plantResult, solvePlant, type PlantOutcome } from '../../src/plant/index.js';
import { saturatedLiquid, saturatedVapour, saturationTemperature, statePT } from '../../src/properties/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { loadPlant, smallCase } from './helpers/cases.js';
import { caseOpening } from '../helpers/caseText.js';

type Solved = Extract<PlantOutcome, { ok: true }>;

async function solved(text: string): Promise<Solved> {
  const outcome = await solvePlant(loadPlant(text));
  if (!outcome.ok) throw new Error(`expected a solution, got: ${outcome.message}`);
  return outcome;
}

const unit = (outcome: Solved, id: string) => plantResult(outcome).units.find((candidate) => candidate.id === id)!;
const P_MAIN = 1.101325; // 10 barg on 101.325 kPa
const P_DA = 0.121325; // 0.2 barg = 0.02 MPa above 101.325 kPa

describe('solvePlant: one boiler, one user, a deaerator, solved by hand', () => {
  it('fuel = steam x enthalpy rise / efficiency, with the deaerator balance closed by hand', async () => {
    const outcome = await solved(smallCase());
    // By hand (IF97 states): the user takes 20 t/h of dry saturated steam at
    // 10 barg and returns nothing, so makeup M = 20 t/h enters the deaerator at
    // 15 degC. Deaerator: M h_m + D h_g = (M + D) h_fw, so the heating steam
    // D = M (h_fw - h_m) / (h_g - h_fw). Feedwater pump (no pumps described,
    // efficiency 1): w = v_f (p_boiler - p_da). Boiler: S = M + D, fuel = S (h_g - h_fw - w) / 0.8.
    const makeup = 20 / 3.6;
    const hg = saturatedVapour(P_MAIN).h;
    const liquid = saturatedLiquid(P_DA);
    const hm = statePT(0.101325, 288.15).h;
    const heating = (makeup * (liquid.h - hm)) / (hg - liquid.h);
    const steam = makeup + heating;
    const pumpWork = liquid.v * (P_MAIN - P_DA) * 1000;
    const fuel = (steam * (hg - liquid.h - pumpWork)) / 0.8;
    expectClose(Number(unit(outcome, 'deaerator').values.heating_steam_kg_s), heating, 1e-9, 'deaerator steam');
    expectClose(Number(unit(outcome, 'b1').values.steam_kg_s), steam, 1e-9, 'boiler steam');
    expectClose(Number(unit(outcome, 'b1').values.fuel_kW), fuel, 1e-9, 'boiler fuel');
    // Cost: fuel at 10 USD/GJ, makeup at 0.5 USD/t, pump power bought at 100 USD/MWh.
    const totals = plantResult(outcome).totals;
    expectClose(totals.cost_per_h, fuel * 0.0036 * 10 + makeup * 3.6 * 0.5 + steam * pumpWork * 0.1, 1e-9, 'cost per hour');
  });

  it('the marginal value of steam equals its fuel cost when the boiler is on the margin', async () => {
    const outcome = await solved(smallCase());
    const header = plantResult(outcome).headers[0];
    // One more tonne drawn at the header costs its makeup, deaerator steam and fuel: more than the
    // fuel for the enthalpy rise alone, 1000 (h_g - h_fw) / 0.8 kJ at 10 USD/GJ, and less than twice it.
    const fuelOnly = ((saturatedVapour(P_MAIN).h - saturatedLiquid(P_DA).h) / 0.8) * 1e-6 * 1000 * 10;
    expect(header.marginal_value_per_t).toBeGreaterThan(fuelOnly);
    expect(header.marginal_value_per_t).toBeLessThan(2 * fuelOnly);
  });

  it('condensate returned to the deaerator cuts makeup one for one', async () => {
    const outcome = await solved(smallCase({ returnPercent: 60, condensateTemperature: '90 degC' }));
    expectClose(Number(unit(outcome, 'deaerator').values.makeup_kg_s), (20 / 3.6) * 0.4, 1e-9, 'makeup');
    expect(outcome.audit.worstRelative).toBeLessThan(1e-6);
  });
});

describe('solvePlant: letdown with desuperheater', () => {
  it('spray water = m (h_in - h_out) / (h_out - h_w) with IF97 values', async () => {
    const outcome = await solved(smallCase({ letdown: true }));
    const letdown = unit(outcome, 'prv');
    const hIn = statePT(4.101325, 673.15).h; // controlled header at 400 degC
    const hOut = statePT(1.101325, 493.15).h; // target 220 degC at 10 barg
    const hWater = saturatedLiquid(P_DA).h; // feedwater from the deaerator
    const steam = Number(letdown.values.steam_kg_s);
    expectClose(Number(letdown.values.inlet_h_kJ_kg), hIn, 1e-9, 'inlet enthalpy');
    expectClose(Number(letdown.values.spray_kg_s), (steam * (hIn - hOut)) / (hOut - hWater), 1e-9, 'spray water');
    expect(outcome.audit.worstRelative).toBeLessThan(1e-6);
  });
});

describe('solvePlant: infeasible demands', () => {
  it('names the short header and by how much', async () => {
    const outcome = await solvePlant(loadPlant(smallCase({ boilerMax: '10 t/h', userSteam: '30 t/h' })));
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.reason).toBe('infeasible');
    expect(outcome.message).toMatch(/main is short of/);
    expect(outcome.message).toMatch(/b1 at maximum steam/);
    const short = outcome.diagnosis!.shortfalls.find((item) => item.node === 'main')!;
    // 30 t/h asked, 10 t/h of boiler steam less what the deaerator takes.
    expect(short.amount * 3.6).toBeGreaterThan(20);
    expect(short.amount * 3.6).toBeLessThan(22);
  });

  it('property: any demand beyond the boiler names the header, any demand within it solves and closes its audit', async () => {
    await fc.assert(
      fc.asyncProperty(fc.integer({ min: 5, max: 80 }), fc.integer({ min: 1, max: 90 }), fc.integer({ min: 0, max: 95 }), async (boilerMax, demand, returned) => {
        const outcome = await solvePlant(loadPlant(smallCase({ boilerMax: `${boilerMax} t/h`, userSteam: `${demand} t/h`, returnPercent: returned })));
        // The boiler must also heat the deaerator: at most about 20 % on top of the demand here.
        if (demand > boilerMax) {
          expect(outcome.ok).toBe(false);
          if (!outcome.ok) expect(outcome.message).toMatch(/main is short of/);
        } else if (demand * 1.25 < boilerMax) {
          expect(outcome.ok).toBe(true);
          if (outcome.ok) expect(outcome.audit.worstRelative).toBeLessThan(1e-6);
        }
      }),
      { numRuns: 25 },
    );
  });
});

describe('solvePlant on the demo cases', () => {
  const cases = readdirSync('cases').filter((name) => name.endsWith('.yaml'));
  for (const name of cases) {
    it(`${name} converges, closes its audit, and HiGHS and javascript-lp-solver agree on the optimum`, async () => {
      const plant = loadPlant(readFileSync(`cases/${name}`, 'utf8'));
      const highs = await solvePlant(plant);
      if (!highs.ok) throw new Error(highs.message);
      expect(highs.audit.worstRelative).toBeLessThan(1e-6);
      const second = await solvePlant(plant, { backend: jslpBackend });
      if (!second.ok) throw new Error(second.message);
      expectClose(second.result.objective!, highs.result.objective!, 1e-6, `${name} objective`);
    });
  }
});

describe('solvePlant: a flash tank in the plant', () => {
  it('flashes 10.3 % of saturated 150 psig condensate at 30 psig (US DOE Steam Tip Sheet #12)', async () => {
    // A 150 psig header feeds a user whose condensate (saturated at 150 psig) all goes to a
    // 30 psig flash tank; the vapour joins the 30 psig header through its balance.
    // Condensate 1 mK below saturation at 150 psig (164.696 psia): saturated for all purposes.
    const condensateC = saturationTemperature((150 * 6.894757293168 + 101.325) / 1000) - 273.15 - 0.001;
    const text = smallCase({ returnPercent: 100 })
      .replace('pressure: 10 barg', 'pressure: 150 psig')
      .replace(/condensate: \{ return: 100 %, temperature: 90 degC, to: deaerator \}/, `condensate: { return: 100 %, temperature: ${condensateC.toFixed(4)} degC, to: flash }`)
      .replace('deaerator:\n', `flash_tanks:
  - { id: flash, pressure: 30 psig, vapour_to: low, liquid_to: deaerator }
deaerator:
`)
      .replace('headers:\n', 'headers:\n  - { id: low, pressure: 30 psig, state: floating, venting: allowed }\n');
    const outcome = await solved(text);
    const tank = unit(outcome, 'flash');
    const fraction = Number(tank.values.vapour_kg_s) / Number(tank.values.inflow_kg_s);
    // The tip sheet prints one decimal from older steam tables: +-0.1 point.
    expect(Math.abs(fraction * 100 - 10.3)).toBeLessThan(0.1);
    expect(outcome.audit.worstRelative).toBeLessThan(1e-6);
  });
});

describe('solvePlant: data that contradict each other', () => {
  it('a turbine exhaust enthalpy above its inlet names the turbine and the numbers', async () => {
    const text = smallCase({ letdown: true }).replace(
      'users:\n',
      `turbines:
  - id: st1
    inlet: main
    stages:
      - { to: low, exhaust_enthalpy: 3400 kJ/kg, section_flow: { max: 20 t/h } }
    mechanical_efficiency: 98 %
    generator_efficiency: 96 %
    power: { max: 2 MW }
    can_switch_off: true
    drives: generator
users:
`,
    );
    const outcome = await solvePlant(loadPlant(text));
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.reason).toBe('physics');
    expect(outcome.message).toMatch(/^turbine st1 stage 1: exhaust enthalpy 3400\.0 kJ\/kg is not below its inlet's 32\d\d\.\d kJ\/kg/);
  });
});

describe('solvePlant: generated two-header plants', () => {
  const plantText = (p: { hpUser: number; lpUser: number; returned: number; efficiency: number; turbine: boolean; venting: boolean; hpFloating: boolean }) => `${caseOpening({ name: 'Generated plant', fuelPrice: 8 })}power:
  site_demand: 500 kW
  import: { price: 90 USD/MWh, max: 10 MW }
  export: { price: 30 USD/MWh, max: 5 MW }
headers:
  - id: hp
    pressure: 40 barg
    state: ${p.hpFloating ? 'floating' : 'controlled\n    temperature: 400 degC'}
    venting: forbidden
    heat_loss: 50 kW
  - { id: lp, pressure: 4 barg, state: floating, venting: ${p.venting ? 'allowed' : 'forbidden'}, heat_loss: 20 kW }
boilers:
  - id: b1
    header: hp
    fuels: [gas]
    steam: { min: 5 t/h, max: ${Math.ceil((p.hpUser + p.lpUser) * 2 + 10)} t/h }
    outlet_temperature: 420 degC
    efficiency: [{ load: 30 %, efficiency: 80 % }, { load: 100 %, efficiency: 85 % }]
    blowdown: 2 %
    can_switch_off: false
letdowns:
  - id: prv
    from: hp
    to: lp
    capacity: 200 t/h
    desuperheater: { target_temperature: 170 degC, spray_water: feedwater }
${p.turbine ? `turbines:
  - id: bpt
    inlet: hp
    stages:
      - { to: lp, isentropic_efficiency: ${(p.efficiency * 100).toFixed(1)} %, section_flow: { max: 30 t/h } }
    mechanical_efficiency: 98 %
    generator_efficiency: 96 %
    power: { max: 5 MW }
    can_switch_off: true
    drives: generator
` : ''}users:
  - { id: hp_user, header: hp, steam: ${p.hpUser} t/h, condensate: { return: ${p.returned} %, temperature: 180 degC, to: deaerator } }
  - { id: lp_user, header: lp, heat: ${(p.lpUser * 0.6).toFixed(2)} MW, condensate: { return: ${p.returned} %, temperature: 120 degC, to: deaerator } }
deaerator:
  pressure: 0.2 barg
  heating_steam: lp
  vent: 0.1 %
objective: minimum_cost
`;

  it('property: every generated plant converges and closes its audit, site energy balance included', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.record({
          hpUser: fc.integer({ min: 1, max: 40 }),
          lpUser: fc.integer({ min: 1, max: 40 }),
          returned: fc.integer({ min: 0, max: 95 }),
          efficiency: fc.double({ min: 0.5, max: 0.85, noNaN: true }),
          turbine: fc.boolean(),
          venting: fc.boolean(),
          hpFloating: fc.boolean(),
        }),
        async (parameters) => {
          const outcome = await solvePlant(loadPlant(plantText(parameters)));
          if (!outcome.ok) throw new Error(`${JSON.stringify(parameters)}: ${outcome.message}`);
          expect(outcome.audit.worstRelative).toBeLessThan(1e-6);
          expect(outcome.audit.site.relative).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 30 },
    );
  });
});

describe('solvePlant: electricity that cannot be met', () => {
  it('names the site power balance, the shortfall and the import limit', async () => {
    const outcome = await solvePlant(loadPlant(smallCase().replace('site_demand: 0 kW', 'site_demand: 12 MW')));
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    // 12 MW asked, 10 MW of import allowed, a few kW of feedwater pumping on top.
    expect(outcome.message).toMatch(/cannot be met: site power is short of 2,0\d\d kW of electricity\. /);
    expect(outcome.message).toMatch(/grid import at its limit/);
  });
});

describe('solvePlant: limits a case leaves open', () => {
  it('a switchable turbine with no flow or power maximum still solves', async () => {
    const text = smallCase({ letdown: true }).replace(
      'users:\n',
      `turbines:
  - id: st1
    inlet: main
    stages:
      - { to: low, isentropic_efficiency: 70 % }
    mechanical_efficiency: 98 %
    generator_efficiency: 96 %
    can_switch_off: true
    drives: generator
users:
`,
    );
    const outcome = await solved(text);
    expect(outcome.audit.worstRelative).toBeLessThan(1e-6);
    // Power is bought at 100 USD/MWh and cannot be sold: the turbine runs to cover the
    // plant's own pumping load and no more.
    const grid = unit(outcome, 'grid');
    expect(Number(unit(outcome, 'st1').values.power_kW)).toBeGreaterThan(0);
    expectClose(Number(unit(outcome, 'st1').values.power_kW), Number(grid.values.modelled_loads_kW), 1e-6, 'turbine power');
    expect(Number(grid.values.import_kW)).toBeLessThan(1e-6);
  });
});

describe('solvePlant: heat-duty users on a floating header', () => {
  // A back-pressure turbine beside a plain letdown into a floating LP header whose
  // only user asks for heat. The turbine's exhaust is colder than throttled steam,
  // so the user needs more of it: power is not free. Per kWh the turbine costs
  // about 1 / (eta_m eta_g (h_HP - h_c)) kg more HP steam (the user's extra flow);
  // at 8 USD/GJ and 80 % boiler efficiency that is worth some 40 to 50 USD/MWh.
  const text = (price: number) => `${caseOpening({ name: 'Duty user plant', makeupCost: 0, fuelPrice: 8, co2: 0 })}power:
  site_demand: 3 MW
  import: { price: ${price} USD/MWh, max: 10 MW }
  export: { price: 0 USD/MWh, max: 0 MW }
headers:
  - { id: hp, pressure: 40 barg, state: floating, venting: forbidden }
  - { id: lp, pressure: 4 barg, state: floating, venting: forbidden }
boilers:
  - id: b1
    header: hp
    fuels: [gas]
    steam: { min: 0 t/h, max: 80 t/h }
    outlet_temperature: 420 degC
    efficiency: [{ load: 100 %, efficiency: 80 % }]
    blowdown: 0 %
    can_switch_off: false
letdowns:
  - { id: prv, from: hp, to: lp, capacity: 80 t/h, desuperheater: none }
turbines:
  - id: bpt
    inlet: hp
    stages:
      - { to: lp, isentropic_efficiency: 70 %, section_flow: { max: 30 t/h } }
    mechanical_efficiency: 98 %
    generator_efficiency: 96 %
    can_switch_off: true
    drives: generator
users:
  - { id: process, header: lp, heat: 15 MW, condensate: { return: 100 %, temperature: 130 degC, to: deaerator } }
deaerator:
  pressure: 0.2 barg
  heating_steam: lp
  vent: 0 %
objective: minimum_cost
`;

  it('the turbine stays idle when power is cheap and runs when it is dear', async () => {
    const cheap = await solved(text(20));
    const dear = await solved(text(200));
    expect(Number(unit(cheap, 'bpt').values.inlet_kg_s)).toBeLessThan(1e-6);
    // Dear power: all the LP steam goes through the turbine, none through the letdown.
    expect(Number(unit(dear, 'bpt').values.inlet_kg_s)).toBeGreaterThan(5);
    expect(Number(unit(dear, 'prv').values.steam_kg_s)).toBeLessThan(1e-6);
    for (const outcome of [cheap, dear]) {
      expect(outcome.audit.worstRelative).toBeLessThan(1e-6);
      // The duty is met at the converged header enthalpy.
      expectClose(Number(unit(outcome, 'process').values.heat_kW), 15000, 1e-5, 'process heat');
    }
  });
});
