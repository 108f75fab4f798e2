// The savings tables, overlays and charts are drawn from the result alone;
// the HTML report's savings section carries both charts as SVG.
import { describe, expect, test } from 'vitest';
import { loadCaseText } from '../../src/model/index.js';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { htmlReport, measureOverlaysYaml, plantDisplayFormat, savingsCharts, savingsTables } from '../../src/report/index.js';
import { findSavings } from '../../src/savings/index.js';
import { caseOpening } from '../helpers/caseText.js';

const text = `${caseOpening({ name: 'Chart works (invented)' })}power: { site_demand: 2 MW, import: { price: 120 USD/MWh, max: 10 MW } }
headers:
  - { id: hp, pressure: 30 barg, state: controlled, temperature: 350 degC, venting: forbidden }
  - { id: lp, pressure: 3 barg, state: floating, venting: allowed }
boilers:
  - { id: boiler, header: hp, fuels: [gas], steam: { min: 5 t/h, max: 40 t/h }, outlet_temperature: 350 degC, efficiency: 85 %, blowdown: 3 %, can_switch_off: false }
letdowns:
  - { id: prv, from: hp, to: lp, capacity: 30 t/h }
users:
  - { id: dryer, header: lp, steam: 10 t/h, condensate: { return: 50 %, temperature: 100 degC, to: deaerator } }
deaerator: { pressure: 0.3 barg, heating_steam: lp, vent: 0.2 %, feedwater_pumps: none }
`;

describe('savings output', async () => {
  const loaded = loadCaseText(text, 'c.yaml');
  if (!loaded.ok) throw new Error('the test case must load');
  const savings = await findSavings(text, loaded.plant, loaded.variants, { workers: 1 });
  const format = plantDisplayFormat(loaded.plant);

  test('the tables list every measure, the roadmap and the capital basis with the accuracy class', () => {
    const tables = savingsTables(savings, format);
    expect(tables.map((table) => table.id)).toEqual(['measures', 'unsolved', 'vents', 'roadmap', 'interactions', 'capital']);
    expect(tables[0].rows.length + tables[1].rows.length).toBe(savings.measures.length);
    expect(tables[3].rows.length).toBe(savings.roadmap.length);
    expect(tables[5].title).toMatch(/screening estimate, -30 % to \+50 %/);
  });

  test('a roadmap step that adds next to nothing says so, and says when the steps before leave steam vented', () => {
    expect(savings.roadmap.length).toBeGreaterThan(1);
    const changed = structuredClone(savings);
    const [first, second] = changed.roadmap;
    if (!first.result.ok) throw new Error('the first step should solve');
    second.standalone_saving = 1000;
    second.incremental_saving = 0;
    first.result.physical.vented_less_t_per_h = -1.8;
    const roadmap = savingsTables(changed, format).find((table) => table.id === 'roadmap')!;
    expect(roadmap.rows[1][4]).toMatch(/^0 USD \(next to nothing once the steps before are in: they leave 1\.80 t\/h more steam vented than today, and what it saves is vented too\)$/);
    first.result.physical.vented_less_t_per_h = 0;
    expect(savingsTables(changed, format).find((table) => table.id === 'roadmap')!.rows[1][4]).toMatch(/^0 USD \(next to nothing once the steps before are in\)$/);
    // As solved, this plant's steps each add a good part of what they save alone.
    expect(savingsTables(savings, format).find((table) => table.id === 'roadmap')!.rows.some((row) => row[4].includes('next to nothing'))).toBe(false);
  });

  test('the overlays load back into the case as projects', () => {
    const yaml = measureOverlaysYaml(savings);
    const reloaded = loadCaseText(`${text}${yaml}`, 'c.yaml');
    expect(reloaded.ok).toBe(true);
    if (reloaded.ok) expect(reloaded.variants.projects.length).toBe(savings.measures.length);
  });

  test('both charts are SVG drawn from the result, one bar per ranked measure and per roadmap step', () => {
    const charts = savingsCharts(savings, format);
    const ranked = savings.measures.filter((entry) => entry.result.ok).length;
    expect(charts.ranked).toMatch(/^<svg /);
    expect(charts.ranked.match(/<rect /g)?.length).toBe(ranked);
    expect(charts.roadmap.match(/<rect /g)?.length).toBe(savings.roadmap.length);
  });

  test('the HTML report carries the savings section with both charts', async () => {
    const outcome = await solvePlant(loaded.plant);
    if (!outcome.ok) throw new Error(outcome.message);
    const html = htmlReport(loaded.plant, plantResult(outcome), { savings });
    expect(html).toMatch(/<a href="#savings">Savings<\/a>/);
    expect(html).toMatch(/<section id="savings">[\s\S]*id="savings-ranked"[\s\S]*id="savings-roadmap"[\s\S]*<\/section>/);
  });
});
