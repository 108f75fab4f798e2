// `steamwright state`: one water or steam state, or a stream of them (--batch).
import { fstatSync } from 'node:fs';
import { open } from 'node:fs/promises';
import type { Argv, CommandModule } from 'yargs';
import { formatQuantity, parseQuantity, type ParseOptions, type UnitSystem } from '../../units/index.js';
import type { SteamState } from '../../properties/index.js';
import { batchLines, jsonTooDeep, MAX_BATCH_DEPTH, MAX_BATCH_LINE } from '../batchLines.js';
import { CliError, EXIT_PROBLEMS } from '../errors.js';
import { evaluateState, stateRecord, type StateInputs } from '../stateRequest.js';

interface StateArgs {
  p?: string;
  T?: string;
  h?: string;
  s?: string;
  x?: string;
  units: UnitSystem;
  json: boolean;
  batch?: string;
  atmosphere?: string;
}

const QUANTITY_OPTIONS = ['p', 'T', 'h', 's', 'x', 'batch', 'atmosphere'] as const;

export const stateCommand: CommandModule<object, StateArgs> = {
  command: 'state',
  describe: 'Water or steam properties by IAPWS-IF97 from p with T, h, s or x (or T with x)',
  builder: (yargs: Argv<object>) =>
    yargs
      .option('p', { type: 'string', describe: 'pressure, e.g. "10 barg", "3 MPa", "150 psig"' })
      .option('T', { type: 'string', describe: 'temperature, e.g. "250 degC", "500 K", "600 degF"' })
      .option('h', { type: 'string', describe: 'specific enthalpy, e.g. "2800 kJ/kg"' })
      .option('s', { type: 'string', describe: 'specific entropy, e.g. "6.5 kJ/(kg K)"' })
      .option('x', { type: 'string', describe: 'vapour quality 0..1 (saturation); with --T alone, by temperature' })
      .option('units', { choices: ['si', 'us'] as const, default: 'si' as UnitSystem, describe: 'units of the table' })
      .option('json', { type: 'boolean', default: false, describe: 'print the state as JSON in SI units' })
      .option('batch', {
        type: 'string',
        describe: 'read JSON lines such as {"p":"3 MPa","T":"300 K"} from FILE (- for stdin); write one JSON line each',
      })
      .option('atmosphere', {
        type: 'string',
        describe: 'atmospheric pressure for gauge units (default 101.325 kPa)',
      })
      .example('$0 state --p "10 barg" --x 1', 'saturated steam at 10 barg')
      .example('$0 state --p "42 barg" --T "400 degC" --units us', 'superheated steam, US units')
      .example('$0 state --batch points.jsonl', 'many states, one JSON line each') as Argv<StateArgs>,
  handler: async (args) => {
    for (const key of QUANTITY_OPTIONS) {
      if (Array.isArray(args[key])) throw new CliError(`--${key} was given more than once; give it once`);
    }
    const options = atmosphereOptions(args.atmosphere);
    if (args.batch !== undefined) {
      const single = (['p', 'T', 'h', 's', 'x'] as const).filter((key) => args[key] !== undefined);
      if (single.length > 0) throw new CliError(`--batch reads every state from its file; drop --${single.join(', --')}`);
      await runBatch(args.batch, options);
      return;
    }
    const outcome = evaluateState({ p: args.p, T: args.T, h: args.h, s: args.s, x: args.x }, options);
    if (!outcome.ok) throw new CliError(outcome.message);
    process.stdout.write(
      args.json ? `${JSON.stringify(stateRecord(outcome.state), null, 2)}\n` : stateTable(outcome.state, args.units, options),
    );
  },
};

function atmosphereOptions(text: string | undefined): ParseOptions {
  if (text === undefined) return {};
  const parsed = parseQuantity(text, 'pressure');
  if (!parsed.ok) throw new CliError(`--atmosphere: ${parsed.message}`);
  return { atmosphericPressure_MPa: parsed.value };
}

/** A readable two-column table of one state in the chosen unit system. */
export function stateTable(state: SteamState, system: UnitSystem, options: ParseOptions): string {
  const absolute = system === 'si' ? 'MPa' : 'psia';
  // A property table reads to six significant digits, as steam tables print.
  const digits = 6;
  const show = (value: number, kind: Parameters<typeof formatQuantity>[1], extra: Parameters<typeof formatQuantity>[3] = {}): string =>
    formatQuantity(value, kind, system, { ...extra, digits });
  const rows: [string, string][] = [
    ['region', regionName(state)],
    ['pressure', `${show(state.p, 'pressure', { ...options, unit: absolute })}  (${show(state.p, 'pressure', options)})`],
    ['temperature', show(state.T, 'temperature')],
    ['saturation temperature', state.Tsat === null ? 'none (above the critical pressure)' : show(state.Tsat, 'temperature')],
  ];
  if (state.superheat !== null) rows.push(['superheat', show(state.superheat, 'temperatureDifference')]);
  if (state.x !== null) rows.push(['vapour quality', state.x.toFixed(4)]);
  rows.push(
    ['specific enthalpy', show(state.h, 'specificEnthalpy')],
    ['specific entropy', show(state.s, 'specificEntropy')],
    ['specific volume', system === 'si' ? `${state.v.toPrecision(6)} m3/kg` : `${(state.v * 16.01846337396).toPrecision(6)} ft3/lb`],
    ['specific heat cp', state.cp === null ? 'not defined in the two-phase region' : show(state.cp, 'specificEntropy')],
  );
  const width = Math.max(...rows.map(([label]) => label.length));
  return rows.map(([label, value]) => `${label.padEnd(width)}  ${value}`).join('\n') + '\nIAPWS-IF97\n';
}

function regionName(state: SteamState): string {
  if (state.region === 4) return '4 (wet steam, saturated)';
  if (state.region === 1) return '1 (compressed or saturated liquid)';
  return '2 (superheated or saturated vapour)';
}

/** The batch input, opened and checked: one clear line (exit 2) for a folder, a missing or unreadable file. */
async function openBatch(source: string): Promise<AsyncIterable<Buffer | string>> {
  if (source === '-') {
    let info;
    try {
      info = fstatSync(0);
    } catch {
      throw new CliError('--batch -: standard input is closed; pipe JSON lines into it, or give a file');
    }
    if (info.isDirectory()) throw new CliError('--batch -: standard input is a folder; give a file of JSON lines');
    return process.stdin;
  }
  let handle;
  try {
    handle = await open(source, 'r');
  } catch (error) {
    throw new CliError(`--batch: cannot read "${source}"${readReason(error)}; give a file of JSON lines, or - for stdin`);
  }
  const info = await handle.stat();
  if (info.isDirectory()) {
    await handle.close();
    throw new CliError(`--batch: "${source}" is a folder; give a file of JSON lines, or - for stdin`);
  }
  return handle.createReadStream();
}

function readReason(error: unknown): string {
  const code = (error as NodeJS.ErrnoException).code;
  if (code === 'EACCES' || code === 'EPERM') return ': permission denied';
  if (code === 'EISDIR') return ': it is a folder';
  if (code === 'ENOTDIR') return ': a part of the path is not a folder';
  if (code === 'EIO') return ': input/output error';
  return '';
}

/** Streams JSON lines in, one JSON line out per input line; a bad line gets {"error"} and the rest go on. */
async function runBatch(source: string, options: ParseOptions): Promise<void> {
  const input = await openBatch(source);
  let lineNumber = 0;
  try {
    for await (const line of batchLines(input)) {
      lineNumber += 1;
      const answer = 'text' in line
        ? batchLine(line.text, lineNumber, options)
        : { error: `line ${lineNumber}: the line has ${line.tooLong} characters; a batch line may have at most ${MAX_BATCH_LINE}` };
      // Respect back-pressure so a million lines need no more memory than ten.
      if (!process.stdout.write(`${JSON.stringify(answer)}\n`)) await new Promise((resolve) => process.stdout.once('drain', resolve));
    }
  } catch (error) {
    if (error instanceof CliError) throw error;
    throw new CliError(`--batch: reading stopped after line ${lineNumber}${readReason(error) || `: ${(error as Error).message}`}`, EXIT_PROBLEMS);
  }
}

function batchLine(line: string, lineNumber: number, options: ParseOptions): Record<string, unknown> {
  if (jsonTooDeep(line)) return { error: `line ${lineNumber}: arrays and objects nest more than ${MAX_BATCH_DEPTH} deep; expected one flat object such as {"p":"3 MPa","T":"300 K"}` };
  let inputs: unknown;
  try {
    inputs = JSON.parse(line);
  } catch {
    return { error: `line ${lineNumber}: not a JSON object, found ${JSON.stringify(line.slice(0, 60))}` };
  }
  if (typeof inputs !== 'object' || inputs === null || Array.isArray(inputs)) {
    return { error: `line ${lineNumber}: expected a JSON object such as {"p":"3 MPa","T":"300 K"}` };
  }
  const unknown = Object.keys(inputs).filter((key) => !['p', 'T', 'h', 's', 'x'].includes(key));
  if (unknown.length > 0) {
    return { error: `line ${lineNumber}: unknown field ${unknown.map((k) => JSON.stringify(k)).join(', ')}; use p with one of T, h, s, x` };
  }
  const outcome = evaluateState(inputs as StateInputs, options);
  return outcome.ok ? stateRecord(outcome.state) : { error: `line ${lineNumber}: ${outcome.message}` };
}
