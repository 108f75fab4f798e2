// Bad input to the savings parts of a case: costs in the wrong unit or
// currency, trap surveys with impossible counts, chillers and orifices that
// cannot be read. Each is refused with its file, line, field, and what was
// expected against what was found.
import { describe, expect, test } from 'vitest';
import { loadCaseText } from '../../src/model/index.js';
import { edited, issuesOf, starter } from './caseText.js';

const withSection = (yaml: string): string => `${starter}\n${yaml}\n`;

describe('costs', () => {
  test('a cost in the wrong unit is refused with its line and the unit expected', () => {
    expect(issuesOf(withSection('costs:\n  back_pressure_turbine: 600 EUR/t'))).toMatch(
      /^case\.yaml:\d+:\d+ {2}costs\.back_pressure_turbine {2}expected a cost such as "600 EUR\/kW" \(per kW or per MW\), found "600 EUR\/t" per t$/m,
    );
    expect(issuesOf(withSection('costs:\n  trap_repair: 350 USD/trap'))).toMatch(/costs\.trap_repair {2}expected a cost in EUR \(the site currency\), found "350 USD\/trap" in USD$/m);
  });
  test('every problem at once', () => {
    const issues = issuesOf(withSection('costs:\n  absorption_chilling: 1500 EUR/kg\n  insulation: cheap\n  life: forever'));
    expect(issues.split('\n').filter((line) => / {2}costs\./.test(line))).toHaveLength(3);
  });
  test('costs given in the site currency are read per their unit', () => {
    const result = loadCaseText(withSection('costs:\n  back_pressure_turbine: 600 EUR/kW\n  absorption_chilling: 1200 EUR/TR\n  condensate_return: 18000 EUR/(t/h)\n  flash_tank: 25000 EUR\n  life: 20 years\n  discount_rate: 8 %'), 'case.yaml');
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const costs = result.plant.costs!;
    expect(costs.backPressureTurbinePerKW).toBe(600);
    expect(costs.absorptionPerKWCooling).toBeCloseTo(1200 / 3.516852842, 6);
    expect(costs.condensateReturnPerKgS).toBeCloseTo(18000 * 3.6, 9);
    expect(costs.flashTank).toBe(25000);
    expect(costs.lifeYears).toBe(20);
    expect(costs.discountRate).toBeCloseTo(0.08, 12);
    expect(costs.defaults.map((entry) => entry.path)).toEqual(['costs.trap_repair', 'costs.insulation', 'costs.makeup_preheater', 'costs.turbine_drive', 'costs.motor_drive']);
  });
  test('each default names its source, or says it is common practice with no source', () => {
    const result = loadCaseText(starter, 'case.yaml');
    if (!result.ok) throw new Error('starter must load');
    for (const entry of result.plant.costs!.defaults) expect(entry.reason, entry.path).toMatch(/DOE Steam Tip Sheet #20|common practice, no source/);
  });
});

describe('trap survey', () => {
  const survey = (line: string): string => withSection(`steam_traps:\n  - { id: hp_traps, header: hp, installed: 40, ${line}, orifice: 1/8 in }`);
  test('more traps failed than installed is refused', () => {
    expect(issuesOf(survey('failed_open: 41'))).toMatch(/^case\.yaml:\d+:\d+ {2}steam_traps\[0\]\.failed_open {2}41 traps failed open is more than the 40 installed; a survey cannot find more failed traps than there are$/m);
  });
  test('a negative or fractional count, or a share above 100 %, is refused', () => {
    expect(issuesOf(survey('failed_open: -1'))).toMatch(/steam_traps\[0\]\.failed_open/);
    expect(issuesOf(survey('failed_open: 2.5'))).toMatch(/steam_traps\[0\]\.failed_open/);
    expect(issuesOf(survey('failed_open: 120 %'))).toMatch(/steam_traps\[0\]\.failed_open {2}expected a percentage from 0 % to 100 %, found "120 %"/);
  });
  test('an orifice that cannot be read is refused', () => {
    expect(issuesOf(withSection('steam_traps:\n  - { id: t, header: hp, installed: 4, failed_open: 1, orifice: one eighth }'))).toMatch(
      /steam_traps\[0\]\.orifice {2}expected an orifice diameter such as "1\/8 in", "0\.125 in" or "3\.2 mm", found "one eighth"/,
    );
  });
  test('a share of those installed is read as a count', () => {
    const result = loadCaseText(survey('failed_open: 15 %'), 'case.yaml');
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.plant.steamTraps![0].failedOpen).toBeCloseTo(6, 12);
  });
});

describe('absorption chillers', () => {
  test('electric chillers in a unit other than kW per ton or per kW are refused', () => {
    expect(issuesOf(withSection('absorption_chillers:\n  - { id: chw, header: hp, cooling: 300 TR, capacity: 0 TR, effect: single, electric_chillers: 0.6 kWh }'))).toMatch(
      /absorption_chillers\[0\]\.electric_chillers {2}expected the electric chillers' power per cooling such as "0\.65 kW\/TR" or "0\.18 kW\/kW", found "0\.6 kWh"/,
    );
  });
  test('a cooling demand in tons of refrigeration is read in kW', () => {
    const result = loadCaseText(withSection('absorption_chillers:\n  - { id: chw, header: hp, cooling: 300 TR, capacity: 100 TR, effect: double, electric_chillers: 0.6 kW/TR }'), 'case.yaml');
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const chiller = result.plant.absorptionChillers![0];
    // 1 TR = 12,000 Btu/h = 3.516853 kW (ASHRAE definition).
    expect(chiller.cooling).toBeCloseTo(300 * 3.516852842, 6);
    expect(chiller.cop).toBe(1.2);
    expect(chiller.electricPerCooling).toBeCloseTo(0.6 / 3.516852842, 9);
  });
});

describe('insulation survey', () => {
  const withLoss = (entry: string): string => withSection(`insulation_survey:\n  - ${entry}`).replace('    temperature: 220 degC\n', '    temperature: 220 degC\n    heat_loss: 40 kW\n');
  test('a length that cannot be read, or a loss after above the loss now, is refused with its line', () => {
    expect(issuesOf(withLoss('{ header: hp, bare_length: long }'))).toMatch(/^case\.yaml:\d+:\d+ {2}insulation_survey\[0\]\.bare_length {2}expected a length such as "80 m" or "260 ft", found "long"$/m);
    expect(issuesOf(withLoss('{ header: hp, bare_length: 30 m, heat_loss_after: 50 kW }'))).toMatch(/insulation_survey\[0\]\.heat_loss_after {2}expected at most the header's heat_loss \(40(\.0+)? kW\), found "50 kW"/);
  });
  test('a header without a heat loss cannot be insulated to any effect', () => {
    expect(issuesOf(withSection('insulation_survey:\n  - { header: hp, bare_length: 30 m }'))).toMatch(/insulation_survey\[0\]\.header {2}header hp states no heat_loss/);
  });
  test('the loss after defaults to a tenth of the header\'s, and the default is listed', () => {
    const result = loadCaseText(withLoss('{ header: hp, bare_length: 100 ft }'), 'case.yaml');
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.plant.insulation).toEqual([{ header: 'hp', bareLength: 30.48, lossAfter: 4 }]);
    expect(result.plant.defaults.map((entry) => entry.path)).toContain('insulation_survey[0].heat_loss_after');
  });
});

describe('makeup preheater on a flash tank', () => {
  const tank = (liquidTo: string, leaving: string): string => withSection(`flash_tanks:\n  - { id: bd, pressure: 2 barg, vapour_to: atmosphere, liquid_to: ${liquidTo}, makeup_preheater: { leaving_temperature: ${leaving} } }`);
  test('on liquid that goes to drain, between the makeup and the tank\'s saturation, it loads', () => {
    const result = loadCaseText(tank('drain', '30 degC'), 'case.yaml');
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.plant.flashTanks[0].makeupPreheater?.leavingTemperature).toBeCloseTo(303.15, 9);
  });
  test('on liquid that goes anywhere but drain, it is refused', () => {
    expect(issuesOf(tank('deaerator', '30 degC'))).toMatch(/^case\.yaml:\d+:\d+ {2}flash_tanks\[0\]\.makeup_preheater {2}a makeup preheater cools liquid on its way to drain, but this tank sends its liquid to deaerator; set liquid_to: drain or leave the preheater out$/m);
  });
  test('leaving at or below the makeup, or at or above the tank\'s saturation, it is refused with both figures', () => {
    expect(issuesOf(tank('drain', '10 degC'))).toMatch(/^case\.yaml:\d+:\d+ {2}flash_tanks\[0\]\.makeup_preheater\.leaving_temperature {2}leaving temperature 10 degC is not above the makeup water's 15\.00 degC; heat flows from the liquid to the makeup, so give a higher temperature$/m);
    expect(issuesOf(tank('drain', '140 degC'))).toMatch(/^case\.yaml:\d+:\d+ {2}flash_tanks\[0\]\.makeup_preheater\.leaving_temperature {2}leaving temperature 140 degC is not below the tank's saturation \(133\.7 degC at 2\.000 barg\); the exchanger cools the liquid, so give a lower temperature$/m);
  });
});

describe('a feedwater pump\'s alternative drive', () => {
  const pump = (alternative: string, motor = 'motor_efficiency: 95 %, '): string =>
    edited(['  vent: 0.5 %\n', `  vent: 0.5 %\n  feedwater_pumps:\n    - { id: bfw1, efficiency: 70 %, ${motor}alternative_drive: ${alternative} }\n`]);
  test('a turbine in place of its motor loads onto the pump', () => {
    const result = loadCaseText(pump('{ turbine_from: hp, turbine_to: lp, isentropic_efficiency: 40 % }'), 'case.yaml');
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.plant.deaerator.feedwaterPumps[0].alternativeDrive).toEqual({ kind: 'turbine', from: 'hp', to: 'lp', isentropicEfficiency: 0.4 });
  });
  test('a motor alternative on a pump that has a motor is refused at its place', () => {
    expect(issuesOf(pump('{ motor_efficiency: 96 % }'))).toMatch(/^case\.yaml:\d+:\d+ {2}deaerator\.feedwater_pumps\[0\]\.alternative_drive\.motor_efficiency {2}bfw1 already has a motor \(motor_efficiency\); a motor alternative replaces a turbine drive, so leave it out or give a turbine alternative$/m);
  });
});

describe('a machine\'s alternative drive', () => {
  const machine = (alternative: string, motor = 'motor_efficiency: 95 %, '): string => withSection(`machines:\n  - { id: p1, type: pump, shaft_power: 100 kW, ${motor}alternative_drive: ${alternative} }`);
  test('a turbine between two headers, down in pressure, in place of the motor, loads', () => {
    const result = loadCaseText(machine('{ turbine_from: hp, turbine_to: lp, isentropic_efficiency: 40 % }'), 'case.yaml');
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.plant.machines[0].alternativeDrive).toEqual({ kind: 'turbine', from: 'hp', to: 'lp', isentropicEfficiency: 0.4 });
  });
  test('a motor alternative on a machine that has a motor is refused', () => {
    expect(issuesOf(machine('{ motor_efficiency: 96 % }'))).toMatch(/^case\.yaml:\d+:\d+ {2}machines\[0\]\.alternative_drive\.motor_efficiency {2}p1 already has a motor \(motor_efficiency\); a motor alternative replaces a turbine drive, so leave it out or give a turbine alternative$/m);
  });
  test('a turbine alternative without its exhaust and efficiency names both, at once', () => {
    const issues = issuesOf(machine('{ turbine_from: hp }'));
    expect(issues).toMatch(/machines\[0\]\.alternative_drive {2}a turbine alternative needs turbine_to as well as turbine_from; add it/);
    expect(issues).toMatch(/machines\[0\]\.alternative_drive {2}a turbine alternative needs isentropic_efficiency as well as turbine_from; add it/);
  });
  test('a turbine alternative up in pressure, or to a header that does not exist, is refused', () => {
    expect(issuesOf(machine('{ turbine_from: lp, turbine_to: hp, isentropic_efficiency: 40 % }'))).toMatch(/machines\[0\]\.alternative_drive\.turbine_to {2}a turbine from lp at 3\.000 barg cannot exhaust to hp at 10\.00 barg; choose a header at a lower pressure/);
    expect(issuesOf(machine('{ turbine_from: hp, turbine_to: nowhere, isentropic_efficiency: 40 % }'))).toMatch(/machines\[0\]\.alternative_drive\.turbine_to {2}no header with id "nowhere"/);
  });
  test('both kinds at once is refused by the schema, once', () => {
    const issues = issuesOf(machine('{ turbine_from: hp, turbine_to: lp, isentropic_efficiency: 40 %, motor_efficiency: 90 % }'));
    expect(issues).toMatch(/machines\[0\]\.alternative_drive {2}an alternative drive is a motor \(motor_efficiency\) or a turbine \(turbine_from, turbine_to, isentropic_efficiency\), one of the two/);
    expect(issues.split('\n').filter((line) => line.includes('alternative_drive'))).toHaveLength(1);
  });
});
