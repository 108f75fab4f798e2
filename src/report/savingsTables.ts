// The savings result as tables (text, Markdown, CSV share them), the
// overlays a planner copies into the case, and the two SVG charts.
import { stringify } from 'yaml';
import type { MeasureResult, SavingsResult } from '../savings/index.js';
import { measureAsProject } from '../savings/index.js';
import { barChartSvg } from './barChart.js';
import type { DisplayFormat } from './displayFormat.js';
import type { ReportTable } from './reportTables.js';

const CRITERION_WORDS: Record<SavingsResult['criterion'], string> = {
  npv: 'net present value',
  saving: 'net annual saving',
  payback: 'simple payback',
  irr: 'internal rate of return',
  co2: 'CO2 avoided',
};

/** Below these a change is round-off, not worth a word: 3.6 kg/h, 0.5 kW. */
const TINY_T_PER_H = 0.0036;
const TINY_MW = 0.0005;

function money(format: DisplayFormat, amount: number | null): string {
  return amount === null ? 'n/a' : format.money(amount);
}

/** The physical change in words, each figure in the case's units. */
export function physicalWords(entry: MeasureResult, format: DisplayFormat): string {
  if (!entry.result.ok) return '-';
  const p = entry.result.physical;
  const kgS = (tPerH: number): number => tPerH / 3.6;
  const parts: string[] = [];
  if (Math.abs(p.vented_less_t_per_h) > TINY_T_PER_H) parts.push(`vent ${p.vented_less_t_per_h > 0 ? 'less' : 'more'} ${format.flow(Math.abs(kgS(p.vented_less_t_per_h)))}`);
  if (Math.abs(p.generated_more_MW) > TINY_MW) parts.push(`${format.power(Math.abs(p.generated_more_MW) * 1000)} ${p.generated_more_MW > 0 ? 'more' : 'less'} generated`);
  if (Math.abs(p.condensate_returned_more_t_per_h) > TINY_T_PER_H) parts.push(`condensate returned ${p.condensate_returned_more_t_per_h > 0 ? 'more' : 'less'} ${format.flow(Math.abs(kgS(p.condensate_returned_more_t_per_h)))}`);
  if (Math.abs(p.makeup_less_t_per_h) > TINY_T_PER_H) parts.push(`makeup ${p.makeup_less_t_per_h > 0 ? 'less' : 'more'} ${format.flow(Math.abs(kgS(p.makeup_less_t_per_h)))}`);
  if (Math.abs(p.trap_steam_less_t_per_h) > TINY_T_PER_H) parts.push(`trap steam less ${format.flow(kgS(p.trap_steam_less_t_per_h))}`);
  if (Math.abs(p.absorption_cooling_more_MW) > TINY_MW) parts.push(`absorption cooling ${format.power(p.absorption_cooling_more_MW * 1000)}`);
  if (Math.abs(p.fuel_less_MW) > TINY_MW) parts.push(`fuel ${p.fuel_less_MW > 0 ? 'less' : 'more'} ${format.fuelRate(Math.abs(p.fuel_less_MW) * 1000)}`);
  return parts.length > 0 ? `${parts.join('; ')} (hours-weighted mean)` : 'no change';
}

function years(value: number | null): string {
  return value === null ? 'never' : `${value.toFixed(1)} yr`;
}

function rate(value: number | null): string {
  return value === null ? 'n/a' : `${(value * 100).toFixed(1)} %`;
}

export function savingsTables(result: SavingsResult, format: DisplayFormat): ReportTable[] {
  const ranked = result.measures.filter((entry) => entry.result.ok);
  const failed = result.measures.filter((entry) => !entry.result.ok);
  const tables: ReportTable[] = [
    {
      id: 'measures',
      title: `Measures ranked by ${CRITERION_WORDS[result.criterion]} (each solved on every scenario, weighted by hours)`,
      headings: ['rank', 'measure', 'physical change', 'annual saving', 'fuel', 'power', 'steam bought', 'water', 'carbon', 'CO2 avoided', 'capital', 'payback', 'NPV', 'IRR'],
      rows: ranked.map((entry) => {
        const solved = entry.result as Extract<MeasureResult['result'], { ok: true }>;
        return [
          String(entry.rank),
          `${entry.id}: ${entry.title}`,
          physicalWords(entry, format),
          `${money(format, solved.annual_saving)}/yr`,
          money(format, solved.annual_saving_by_component.fuel),
          money(format, solved.annual_saving_by_component.power),
          money(format, solved.annual_saving_by_component.steam),
          money(format, solved.annual_saving_by_component.water),
          money(format, solved.annual_saving_by_component.carbon),
          `${Math.round(solved.co2_avoided_t_per_year).toLocaleString('en')} t/yr`,
          money(format, entry.capital),
          years(solved.simple_payback_years),
          money(format, solved.npv),
          rate(solved.irr),
        ];
      }),
    },
    {
      id: 'unsolved',
      title: 'Measures that could not be solved',
      headings: ['measure', 'why'],
      rows: failed.map((entry) => [`${entry.id}: ${entry.title}`, entry.result.ok ? '' : entry.result.reason]),
    },
    {
      id: 'vents',
      title: 'Vents, their causes and the ways to end them',
      headings: ['where', 'mean flow', 'cause', 'ways to end it'],
      rows: result.vents.map((vent) => [vent.where, format.flow(vent.average_kg_s), vent.cause, vent.ways.join('; ')]),
    },
    {
      id: 'roadmap',
      title: 'Roadmap: the measures that save money, applied in rank order, re-solved at each step',
      headings: ['step', 'measure added', 'capital so far', 'annual saving so far', 'added by this step', 'alone', 'NPV so far'],
      rows: result.roadmap.map((step, at) => [
        String(step.step),
        step.measure,
        money(format, step.capital),
        step.result.ok ? `${money(format, step.result.annual_saving)}/yr` : `not solved: ${step.result.reason}`,
        addedByStep(step, at > 0 ? result.roadmap[at - 1] : null, format),
        money(format, step.standalone_saving),
        step.result.ok ? money(format, step.result.npv) : 'n/a',
      ]),
    },
    {
      id: 'interactions',
      title: 'Measures that interact',
      headings: ['measures', 'how'],
      rows: result.interactions.map((entry) => [entry.measures.join(', '), entry.how]),
    },
    {
      id: 'capital',
      title: `Capital estimates (${result.accuracy})`,
      headings: ['measure', 'capital', 'basis', 'life', 'discount rate'],
      rows: result.measures.map((entry) => [entry.id, money(format, entry.capital), entry.capitalBasis, `${entry.lifeYears} yr`, rate(entry.discountRate)]),
    },
  ];
  return tables;
}

/**
 * What a roadmap step adds; where that is next to nothing against what the
 * measure saves alone, say so, and when the steps before leave more steam
 * vented than today, that what it saves goes there.
 */
function addedByStep(step: SavingsResult['roadmap'][number], before: SavingsResult['roadmap'][number] | null, format: DisplayFormat): string {
  const added = money(format, step.incremental_saving);
  if (step.incremental_saving === null || step.standalone_saving === null || !(step.standalone_saving > 0) || step.incremental_saving > 0.01 * step.standalone_saving) return added;
  const ventedMore = before?.result.ok ? -before.result.physical.vented_less_t_per_h : 0;
  const vent = ventedMore > 0.01 ? `: they leave ${format.flow(ventedMore / 3.6)} more steam vented than today, and what it saves is vented too` : '';
  return `${added} (next to nothing once the steps before are in${vent})`;
}

/** Each measure as the project a planner copies under `projects:` in the case, then edits. */
export function measureOverlaysYaml(result: SavingsResult): string {
  const projects = result.measures.map((entry) => measureAsProject(entry, result.currency));
  return stringify({ projects }, { lineWidth: 0 });
}

/** Ranked net present values and the roadmap's cumulative saving, as SVG bar charts. */
export function savingsCharts(result: SavingsResult, format: DisplayFormat): { ranked: string; roadmap: string } {
  const ranked = result.measures.filter((entry) => entry.result.ok).map((entry) => {
    const value = entry.result.ok ? (result.criterion === 'co2' ? entry.result.co2_avoided_t_per_year : result.criterion === 'npv' ? entry.result.npv : entry.result.net_annual_saving) : 0;
    return { label: entry.id, value, text: result.criterion === 'co2' ? `${Math.round(value).toLocaleString('en')} t/yr` : money(format, value) };
  });
  const roadmap = result.roadmap.map((step) => ({
    label: `${step.step}. ${step.measure}`,
    value: step.result.ok ? step.result.annual_saving : 0,
    text: step.result.ok ? `${money(format, step.result.annual_saving)}/yr for ${money(format, step.capital)}` : 'not solved',
  }));
  const rankedTitle = result.criterion === 'npv' ? 'Net present value of each measure' : result.criterion === 'co2' ? 'CO2 avoided by each measure' : 'Net annual saving of each measure';
  return {
    ranked: barChartSvg('savings-ranked', rankedTitle, ranked),
    roadmap: barChartSvg('savings-roadmap', 'Roadmap: cumulative annual saving after each step', roadmap),
  };
}

/** The HTML report's savings section: both charts, the tables, the overlays to copy. */
export function savingsSectionHtml(result: SavingsResult, format: DisplayFormat, tableHtml: (table: ReportTable, prefix?: string) => string, escape: (text: string) => string): string {
  const charts = savingsCharts(result, format);
  return [
    '<section id="savings"><h2>Savings</h2>',
    `<p>Each measure is an overlay on the case, solved on every scenario and weighted by hours; its saving is the difference of the two solves. Capital: ${escape(result.accuracy)}.</p>`,
    `<div class="charts">${charts.ranked}${charts.roadmap}</div>`,
    ...savingsTables(result, format).map((table) => tableHtml(table, 'savings')),
    '<h3 id="savings-overlays">The measures as projects to copy into the case</h3>',
    `<pre>${escape(measureOverlaysYaml(result))}</pre>`,
    '</section>',
  ].join('\n');
}
