// The year's charts: drawn from the result and records, every header and
// source present, long years thinned, names from the case escaped.
import { describe, expect, test } from 'vitest';
import { displayFormat, lineChartSvg, stackedColumnsSvg, yearHtml } from '../../src/report/index.js';
import type { PeriodRecord, YearResult } from '../../src/year/index.js';

const format = displayFormat('si', 'EUR', 0.101325);

describe('year charts', () => {
  test('a line of 8760 values is thinned to at most 800 points, and means keep the level', () => {
    const values = Array.from({ length: 8760 }, (_, at) => (at % 2 === 0 ? 10 : 20));
    const svg = lineChartSvg('x', 'a year', 't/h', 'hours', [{ label: 'steam', values }]);
    const points = /points="([^"]+)"/.exec(svg)![1].split(' ');
    expect(points.length).toBeLessThanOrEqual(800);
    // Each point is the mean of about 11 alternating hours: near 15 t/h, so all y within the middle of the plot.
    const ys = points.map((point) => Number(point.split(',')[1]));
    expect(Math.max(...ys) - Math.min(...ys)).toBeLessThan(15);
  });

  test('stacked columns: one rectangle per source and month, heights adding to the total', () => {
    const svg = stackedColumnsSvg('s', 'supply', 't', ['Jan', 'Feb'], [{ label: 'boiler_1', values: [100, 0] }, { label: 'kiln_<hrsg>', values: [50, 150] }]);
    const heights = [...svg.matchAll(/<rect x="[^"]+" y="[^"]+" width="[^"]+" height="([^"]+)" fill="#[^"]+"><title>/g)].map((match) => Number(match[1]));
    expect(heights).toHaveLength(4);
    expect(heights[0] + heights[1]).toBeCloseTo(heights[2] + heights[3], 0);
    expect(svg).toContain('kiln_&lt;hrsg&gt;');
    expect(svg).not.toContain('kiln_<hrsg>');
  });

  test('the page has the five charts and the safety caution', () => {
    const record = (index: number): PeriodRecord => ({
      index, label: `h${index}`, hours: 1, month: 1, ok: true, cost_per_h: 100, cost_by_component_per_h: { fuel: 100, power: 0, steam: 0, water: 0, carbon: 0 },
      fuel_GJ_per_h: 1, steam_raised_kg_s: 1, process_steam_kg_s: 1 + index, process_heat_kW: 0, power_generated_kW: 0, power_imported_kW: 10 * index, power_exported_kW: 0,
      site_demand_kW: 0, vented_kg_s: 0, let_down_kg_s: 0, makeup_kg_s: 0, co2_kg_per_h: 0, marginal_per_t: [20 + index], units: [{ running: 1, out: false, steam_kg_s: 1, fuel_kW: 1, power_kW: 0, limits: [] }], passes: 2, how: 'full',
    });
    const records = [record(0), record(1), record(2)];
    const result = {
      plant: 'Test <mill>', currency: 'EUR', unit_system: 'si', objective: 'minimumCost', marginal_value_unit: 'currency', mode: 'independent periods', mode_note: '',
      profile: { file: 'p.csv', kind: 'hourly', periods: 3, columns: [] }, block_periods: 168, periods: 3, hours: 3, hours_solved: 3, complete: true,
      annual: { hours: 3, cost: 300, start_up_cost: 0, cost_by_component: { fuel: 300, power: 0, steam: 0, water: 0, carbon: 0 }, fuel_GJ: 3, steam_raised_t: 10.8, process_steam_t: 0, process_heat_GJ: 0, power_generated_MWh: 0, power_imported_MWh: 0.03, power_exported_MWh: 0, site_demand_MWh: 0, vented_t: 0, let_down_t: 0, makeup_t: 0, co2_t: 0 },
      months: [{ month: 1, hours: 3, cost: 300, start_up_cost: 0, cost_by_component: { fuel: 300, power: 0, steam: 0, water: 0, carbon: 0 }, fuel_GJ: 3, steam_raised_t: 10.8, process_steam_t: 0, process_heat_GJ: 0, power_generated_MWh: 0, power_imported_MWh: 0.03, power_exported_MWh: 0, site_demand_MWh: 0, vented_t: 0, let_down_t: 0, makeup_t: 0, co2_t: 0, supply_t: { b1: 10.8 } }],
      units: [{ id: 'b1', kind: 'boiler', hours_running: 3, starts: 0, start_up_cost: 0, hours_out_of_service: 0, hours_at_limit: {}, steam_t: 10.8, fuel_GJ: 3, power_MWh: 0 }],
      headers: [{ id: 'hp', name: 'HP', hours: 3, mean_per_t: 21, min_per_t: 20, p10_per_t: 20, median_per_t: 21, p90_per_t: 22, max_per_t: 22 }],
      failed: [], how: { neighbour: 0, full: 3, same_as_earlier: 0, one_pass: 0 },
    } as YearResult;
    const html = yearHtml(result, records, format);
    for (const id of ['year-steam-duration', 'year-import-duration', 'year-marginal-values', 'year-supply-by-month', 'year-running-hours']) expect(html).toContain(`id="${id}"`);
    expect(html).toContain('ASME B31.1');
    expect(html).toContain('Test &lt;mill&gt;');
    expect(html).not.toContain('<mill>');
  });
});
