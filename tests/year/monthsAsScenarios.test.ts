// A profile of 12 monthly periods equals the same months written as scenarios
// with hours: two independent paths from the same numbers to a solved plant.
// The profile writes its values straight into the resolved plant (periodPlant)
// and solves the months in one block, each warm from the month before; the
// scenarios go through the YAML overlay and the case resolver and are solved
// cold, one by one.
import { describe, expect, test } from 'vitest';
import { annualTotals, compareScenarios } from '../../src/scenarios/index.js';
import { loadCaseText } from '../../src/model/index.js';
import { runYear, type PeriodRecord } from '../../src/year/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { loadPlant, millBase, profileOf } from './helpers.js';

interface Month {
  id: string;
  hours: number;
  heating: number;
  dryer: number;
  whiteWater: number;
  kiln: number;
  importPrice: number;
  gasPrice: number;
  siteDemand: number;
  makeup: number;
  boiler1: 0 | 1;
}

// Invented months for the invented mill; July has boiler 1 out for overhaul.
const MONTHS: Month[] = [
  { id: 'jan', hours: 744, heating: 9.2, dryer: 27, whiteWater: 3, kiln: 16, importPrice: 124, gasPrice: 10.9, siteDemand: 7.5, makeup: 5, boiler1: 1 },
  { id: 'feb', hours: 672, heating: 8.6, dryer: 27.5, whiteWater: 3.1, kiln: 16.5, importPrice: 120, gasPrice: 10.7, siteDemand: 7.6, makeup: 5.5, boiler1: 1 },
  { id: 'mar', hours: 744, heating: 6.8, dryer: 26.5, whiteWater: 2.9, kiln: 15.5, importPrice: 112, gasPrice: 10.1, siteDemand: 7.4, makeup: 7.5, boiler1: 1 },
  { id: 'apr', hours: 720, heating: 4.4, dryer: 27, whiteWater: 3, kiln: 16, importPrice: 104, gasPrice: 9.5, siteDemand: 7.3, makeup: 10, boiler1: 1 },
  { id: 'may', hours: 744, heating: 2.2, dryer: 25, whiteWater: 2.8, kiln: 16, importPrice: 98, gasPrice: 9.0, siteDemand: 7.0, makeup: 13, boiler1: 1 },
  { id: 'jun', hours: 720, heating: 1.0, dryer: 24.5, whiteWater: 2.7, kiln: 15, importPrice: 92, gasPrice: 8.6, siteDemand: 6.8, makeup: 15, boiler1: 1 },
  { id: 'jul', hours: 744, heating: 0.8, dryer: 22, whiteWater: 2.6, kiln: 14, importPrice: 90, gasPrice: 8.2, siteDemand: 6.5, makeup: 16, boiler1: 0 },
  { id: 'aug', hours: 744, heating: 0.8, dryer: 24, whiteWater: 2.7, kiln: 15, importPrice: 94, gasPrice: 8.4, siteDemand: 6.9, makeup: 16, boiler1: 1 },
  { id: 'sep', hours: 720, heating: 1.9, dryer: 26, whiteWater: 2.9, kiln: 16, importPrice: 100, gasPrice: 8.9, siteDemand: 7.2, makeup: 14, boiler1: 1 },
  { id: 'oct', hours: 744, heating: 4.6, dryer: 27, whiteWater: 3, kiln: 16, importPrice: 108, gasPrice: 9.6, siteDemand: 7.4, makeup: 11, boiler1: 1 },
  { id: 'nov', hours: 720, heating: 7.1, dryer: 27.5, whiteWater: 3.1, kiln: 16.5, importPrice: 116, gasPrice: 10.3, siteDemand: 7.6, makeup: 8, boiler1: 1 },
  { id: 'dec', hours: 744, heating: 8.9, dryer: 26, whiteWater: 3, kiln: 15.5, importPrice: 126, gasPrice: 11.0, siteDemand: 7.5, makeup: 6, boiler1: 1 },
];

const profileText = [
  'period,hours,month,building_heating.steam [t/h],dryer_section.steam [t/h],white_water_heater.heat [MW],kiln_hrsg.steam [t/h],power.import.price [EUR/MWh],natural_gas.price [EUR/GJ],power.site_demand [MW],site.makeup_water.temperature [degC],boiler_1.available',
  ...MONTHS.map((month, index) => [month.id, month.hours, index + 1, month.heating, month.dryer, month.whiteWater, month.kiln, month.importPrice, month.gasPrice, month.siteDemand, month.makeup, month.boiler1].join(',')),
].join('\n');

const scenariosText = [
  'scenarios:',
  ...MONTHS.flatMap((month) => [
    `  - id: ${month.id}`,
    `    hours: ${month.hours}`,
    '    changes:',
    '      users:',
    `        - { id: building_heating, steam: ${month.heating} t/h }`,
    `        - { id: dryer_section, steam: ${month.dryer} t/h }`,
    `        - { id: white_water_heater, heat: ${month.whiteWater} MW }`,
    '      heat_recovery_boilers:',
    `        - { id: kiln_hrsg, steam: ${month.kiln} t/h }`,
    '      fuels:',
    `        - { id: natural_gas, price: ${month.gasPrice} EUR/GJ }`,
    '      power:',
    `        site_demand: ${month.siteDemand} MW`,
    `        import: { price: ${month.importPrice} EUR/MWh }`,
    '      site:',
    `        makeup_water: { temperature: ${month.makeup} degC }`,
    ...(month.boiler1 === 0 ? ['      disable: [boiler_1]'] : []),
  ]),
].join('\n');

describe('12 monthly periods against 12 scenarios with hours', () => {
  test('every month, and the year, cost the same both ways', async () => {
    const plant = loadPlant(millBase);
    const profile = profileOf(plant, profileText);
    const { result, records } = await runYear({ plant, profile, profileFile: 'profile.csv' }, { workers: 1, keepRecords: true });
    const loaded = loadCaseText(`${millBase}\n${scenariosText}\n`, 'months.yaml');
    if (!loaded.ok) throw new Error(loaded.issues.map((issue) => `${issue.line}: ${issue.message}`).join('; '));
    const comparison = await compareScenarios(loaded.variants, [], { workers: 1 });
    expect(result!.failed).toEqual([]);
    expect(comparison.annual.failed).toEqual([]);
    const tracked = result!.units.map((unit) => unit.id);
    for (const [index, run] of comparison.runs.entries()) {
      const record = records![index] as Extract<PeriodRecord, { ok: true }>;
      expect(record.label).toBe(run.id);
      if (!run.ok) throw new Error(`scenario ${run.id} failed`);
      // Both are converged optima of the same plant; they agree to the convergence tolerance.
      expectClose(record.cost_per_h, run.cost_per_h, 1e-6, `${run.id} cost per h`);
      expectClose(record.fuel_GJ_per_h, run.totals.fuel_GJ_per_h, 1e-5, `${run.id} fuel`);
      expectClose(record.power_imported_kW, run.totals.power_imported_kW, 1e-4, `${run.id} import`);
      expectClose(record.steam_raised_kg_s, run.totals.steam_raised_kg_s, 1e-5, `${run.id} steam raised`);
      for (const [slot, id] of tracked.entries()) {
        const report = run.units.find((unit) => unit.id === id);
        const running = report ? (typeof report.values.running === 'boolean' ? report.values.running : true) : false;
        expect(record.units[slot].running === 1, `${run.id} ${id} running`).toBe(running);
      }
    }
    const annual = annualTotals(comparison.runs);
    expect(result!.hours).toBe(8760);
    expectClose(result!.annual.cost, annual.cost_per_year!, 1e-6, 'annual cost');
    for (const component of ['fuel', 'power', 'water', 'carbon'] as const) {
      expectClose(result!.annual.cost_by_component[component], annual.cost_by_component_per_year![component], 1e-5, `annual ${component}`);
    }
    // July's overhaul is seen by both paths.
    const july = result!.units.find((unit) => unit.id === 'boiler_1')!;
    expect(july.hours_out_of_service).toBe(744);
  });
});
