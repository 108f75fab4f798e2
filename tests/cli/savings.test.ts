// `steamwright savings` as a user runs it: the text table, the overlays to
// copy and the cautions on standard output; Markdown and CSV through the
// output files; JSON in SI.
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { runCli } from '../helpers/cli.js';

/** A V8 stack frame, as tests/cli/hostileInput.test.ts matches it. */
const STACK_FRAME = /^\s+at .*(\(.*:\d+:\d+\)|:\d+:\d+)$/m;

describe('savings on the food-plant demo', () => {
  test('prints the ranked measures, the vents with their causes, the roadmap, the overlays and the cautions; writes --md and --csv', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'steamwright-savings-'));
    const md = join(dir, 'savings.md');
    const csv = join(dir, 'savings.csv');
    const run = await runCli(['savings', 'cases/orchard-vale-foods.yaml', '--md', md, '--csv', csv]);
    expect(run.stderr).not.toMatch(STACK_FRAME);
    expect(run.code, run.stderr).toBe(0);
    expect(run.stdout).toMatch(/^Orchard Vale Foods: savings found from the solved balance/);
    expect(run.stdout).toMatch(/Capital estimates: screening estimate, -30 % to \+50 %/);
    // The summer vent of the 2 barg header, with its cause: the contract's minimum take.
    expect(run.stdout).toMatch(/ lp +[\d.]+ t\/h +lp: [\d.]+ t\/h more steam than its users[^\n]*neighbour's bought steam \([\d.]+ t\/h, at its contract minimum\)/);
    for (const id of ['bptg_prv', 'absorption_cold_stores_on_lp', 'condensing_tg_lp', 'repair_lp_traps', 'repair_mp_traps']) expect(run.stdout).toContain(id);
    expect(run.stdout).toMatch(/Roadmap: the measures that save money/);
    expect(run.stdout).toMatch(/projects:\n {2}- id: /);
    expect(run.stdout).toMatch(/ASME Boiler and Pressure Vessel Code/);
    expect(run.stderr).toContain(`wrote ${md}`);
    expect(readFileSync(md, 'utf8')).toMatch(/^# Orchard Vale Foods: savings\n\n## Measures ranked by net present value/);
    expect(readFileSync(csv, 'utf8')).toMatch(/^table,rank,measure,physical change,annual saving/);
  });

  test('--json gives the measures, each with its solved figures, and the roadmap', async () => {
    const run = await runCli(['savings', 'cases/orchard-vale-foods.yaml', '--json', '--rank', 'payback']);
    expect(run.code, run.stderr).toBe(0);
    const result = JSON.parse(run.stdout) as { criterion: string; measures: { id: string; rank: number | null; result: { ok: boolean; simple_payback_years?: number } }[]; roadmap: unknown[]; base: { id: string }[] };
    expect(result.criterion).toBe('payback');
    expect(result.base.map((run) => run.id)).toEqual(['winter', 'summer', 'weekend']);
    const paybacks = result.measures.filter((entry) => entry.result.ok && entry.result.simple_payback_years !== null).map((entry) => entry.result.simple_payback_years!);
    expect(paybacks).toEqual([...paybacks].sort((a, b) => a - b));
    expect(result.roadmap.length).toBeGreaterThan(2);
  });
});
