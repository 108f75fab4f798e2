// Every file a command writes goes through here, so that no output ever
// destroys an input, another output, a device or a half-written file:
//
// - planOutputs, before any work: refuses an output on an input, two outputs
//   on one path, a folder, a missing folder or an empty name (one located
//   line each, all at once);
// - writeOutputs, after all rendering: writes regular files under temporary
//   names beside them, then renames them all into place in one synchronous
//   step, putting back what was there should any rename fail (all or
//   nothing); writes "-" (standard output) and special files such as
//   /dev/stdout or a FIFO directly, never renaming anything over them.
import { randomBytes } from 'node:crypto';
import { chmodSync, copyFileSync, linkSync, renameSync, unlinkSync, type Stats } from 'node:fs';
import { realpath, stat, unlink, writeFile } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import { CliError, EXIT_PROBLEMS, EXIT_USAGE } from './errors.js';
import { holdPending, releasePending } from './pendingFiles.js';
import { writeStdout } from './stdout.js';

/** One output as the user named it: the option that names it and the path ("-" for standard output). */
export interface OutputRequest {
  option: string;
  path: string;
}

/** An output whose path was checked: how it will be written. */
export interface PlannedOutput extends OutputRequest {
  kind: 'stdout' | 'special' | 'file';
  /** For 'file': the path renamed over (a symlink's target, so the link stays). */
  target: string;
  /** The existing file's mode, kept when it is replaced. */
  mode: number | null;
}

/** Names of standard output that are not a file of their own. */
const STDOUT_NAMES = new Set(['-', '/dev/stdout', '/dev/fd/1', '/proc/self/fd/1']);

/** The longest file name most file systems take (NAME_MAX on Linux, in bytes). */
const NAME_MAX = 255;

interface Identity {
  text: string;
  device: number | null;
  inode: number | null;
}

async function identify(path: string, asOutput: boolean): Promise<Identity> {
  if (asOutput && STDOUT_NAMES.has(path)) return { text: 'standard output', device: null, inode: null };
  let text = resolve(path);
  try {
    text = await realpath(path);
  } catch {
    try {
      text = join(await realpath(dirname(path)), basename(path));
    } catch {
      // A missing folder: the plain resolved path will do.
    }
  }
  try {
    const stats = await stat(path);
    return { text, device: stats.dev, inode: stats.ino };
  } catch {
    return { text, device: null, inode: null };
  }
}

function same(first: Identity, second: Identity): boolean {
  if (first.text === second.text) return true;
  return first.inode !== null && first.device === second.device && first.inode === second.inode;
}

async function statOrNull(path: string): Promise<Stats | null> {
  try {
    return await stat(path);
  } catch {
    return null;
  }
}

/**
 * Checks every output against the inputs and each other before any work is
 * done. Throws one CliError listing every problem (exit 2 for a clash with an
 * input or another output or an empty name, 1 for a missing or unusable folder).
 */
export async function planOutputs(inputs: { option: string; path: string }[], requests: OutputRequest[]): Promise<PlannedOutput[]> {
  const problems: { message: string; code: number }[] = [];
  const inputIds = await Promise.all(inputs.map(async (input) => ({ ...input, id: await identify(input.path, false) })));
  const seen: { option: string; path: string; id: Identity }[] = [];
  const planned: PlannedOutput[] = [];
  for (const request of requests) {
    const { option, path } = request;
    if (path.trim() === '') {
      problems.push({ message: `${option} needs a file name, found an empty one`, code: EXIT_USAGE });
      continue;
    }
    const id = await identify(path, true);
    const input = inputIds.find((candidate) => same(candidate.id, id));
    if (input) {
      problems.push({ message: `${option} "${path}" is the ${input.option} this command reads; give another file name`, code: EXIT_USAGE });
      continue;
    }
    const earlier = seen.find((candidate) => same(candidate.id, id));
    if (earlier && id.text === 'standard output') {
      problems.push({ message: `${earlier.option} and ${option} both write to standard output; give one of them a file name`, code: EXIT_USAGE });
      continue;
    }
    if (earlier) {
      problems.push({ message: `${option} "${path}" is the same file as ${earlier.option} "${earlier.path}"; give each output its own file`, code: EXIT_USAGE });
      continue;
    }
    seen.push({ option, path, id });
    if (STDOUT_NAMES.has(path)) {
      planned.push({ ...request, kind: 'stdout', target: path, mode: null });
      continue;
    }
    const existing = await statOrNull(path);
    if (existing?.isDirectory()) {
      problems.push({ message: `${option} "${path}" is a folder; give a file name`, code: EXIT_USAGE });
      continue;
    }
    const underDevices = /^\/(dev|proc|sys)\//.test(resolve(path)) || /^\/(dev|proc|sys)\//.test(id.text);
    if (existing && (!existing.isFile() || underDevices)) {
      planned.push({ ...request, kind: 'special', target: path, mode: null });
      continue;
    }
    const folder = dirname(id.text);
    const folderStats = await statOrNull(folder);
    if (!folderStats) {
      problems.push({ message: `cannot write "${path}": the folder "${dirname(path)}" does not exist`, code: EXIT_PROBLEMS });
      continue;
    }
    if (!folderStats.isDirectory()) {
      problems.push({ message: `cannot write "${path}": "${dirname(path)}" is not a folder`, code: EXIT_PROBLEMS });
      continue;
    }
    planned.push({ ...request, kind: 'file', target: id.text, mode: existing ? existing.mode & 0o7777 : null });
  }
  if (problems.length > 0) {
    const code = problems.some((problem) => problem.code === EXIT_USAGE) ? EXIT_USAGE : EXIT_PROBLEMS;
    throw new CliError(problems.map((problem) => problem.message).join('\nsteamwright: '), code);
  }
  return planned;
}

/**
 * A hidden name beside `target` for a temporary file, never longer than
 * NAME_MAX bytes however long the target's own name is.
 */
export function temporaryName(target: string, purpose: 'tmp' | 'old' = 'tmp'): string {
  const suffix = `.${randomBytes(4).toString('hex')}.${purpose}`;
  const room = NAME_MAX - 1 - Buffer.byteLength(suffix);
  let name = basename(target);
  if (Buffer.byteLength(name) > room) {
    // Cut by characters, not bytes, so no UTF-8 sequence is split.
    const characters = Array.from(name);
    while (Buffer.byteLength(characters.join('')) > room) characters.pop();
    name = characters.join('');
  }
  return join(dirname(target), `.${name}${suffix}`);
}

function reason(error: unknown): string {
  const code = (error as NodeJS.ErrnoException).code;
  const known: Record<string, string> = {
    ENOSPC: 'no space left on the device',
    EDQUOT: 'disk quota exceeded',
    EACCES: 'permission denied',
    EPERM: 'operation not permitted',
    EROFS: 'the file system is read-only',
    ENOENT: 'the folder does not exist',
    ENOTDIR: 'a part of the path is not a folder',
    EISDIR: 'it is a folder',
    EIO: 'input/output error',
    ENAMETOOLONG: 'the name is too long',
  };
  return (code && known[code]) ?? (error instanceof Error ? error.message : String(error));
}

/** A failed write: one line naming the option and file, and that nothing was written. */
function writeFailure(output: PlannedOutput, error: unknown, count: number): CliError {
  const rest = count > 1 ? '; no output was written' : '';
  const label = output.kind === 'stdout' ? 'standard output' : `"${output.path}"`;
  return new CliError(`${output.option}: cannot write ${label}: ${reason(error)}${rest}`, EXIT_PROBLEMS);
}

/** Test hook: stop after the temporary files are written, so a test can kill the process mid-write. */
async function holdForTests(): Promise<void> {
  if (process.env.STEAMWRIGHT_TEST_HOLD_OUTPUTS !== '1') return;
  process.stderr.write('steamwright: holding outputs\n');
  await new Promise(() => setInterval(() => undefined, 60_000));
}

/**
 * Writes every output or none: regular files first under temporary names,
 * then standard output and special files directly, then all the renames in
 * one synchronous step that puts back the old files should one fail.
 */
export async function writeOutputs(outputs: (PlannedOutput & { text: string })[]): Promise<void> {
  const staged: { output: PlannedOutput; temporary: string }[] = [];
  const removeStaged = async (): Promise<void> => {
    for (const { temporary } of staged) {
      await unlink(temporary).catch(() => undefined);
      releasePending(temporary);
    }
  };
  for (const output of outputs.filter((entry) => entry.kind === 'file')) {
    const temporary = temporaryName(output.target);
    holdPending(temporary);
    staged.push({ output, temporary });
    try {
      await writeFile(temporary, output.text, { encoding: 'utf8', flag: 'wx', mode: output.mode ?? 0o666 });
      if (output.mode !== null) chmodSync(temporary, output.mode);
    } catch (error) {
      await removeStaged();
      throw writeFailure(output, error, outputs.length);
    }
  }
  await holdForTests();
  for (const output of outputs.filter((entry) => entry.kind !== 'file')) {
    try {
      if (output.kind === 'stdout') await writeStdout(output.text);
      else await writeFile(output.path, output.text, { encoding: 'utf8', flag: 'w' });
    } catch (error) {
      await removeStaged();
      throw writeFailure(output, error, outputs.length);
    }
  }
  commit(staged);
}

/** Renames the staged files into place; on a failure, puts every earlier one back. Synchronous, so no signal lands halfway. */
function commit(staged: { output: PlannedOutput; temporary: string }[]): void {
  const done: { target: string; backup: string | null }[] = [];
  let failure: { output: PlannedOutput; error: unknown } | null = null;
  for (const { output, temporary } of staged) {
    let backup: string | null = null;
    try {
      if (output.mode !== null) {
        backup = temporaryName(output.target, 'old');
        holdPending(backup);
        try {
          linkSync(output.target, backup);
        } catch {
          copyFileSync(output.target, backup);
        }
      }
      renameSync(temporary, output.target);
      releasePending(temporary);
      done.push({ target: output.target, backup });
    } catch (error) {
      if (backup) {
        try {
          unlinkSync(backup);
        } catch {
          // Never made.
        }
        releasePending(backup);
      }
      failure = { output, error };
      break;
    }
  }
  if (failure) {
    for (const { target, backup } of done.reverse()) {
      try {
        if (backup) renameSync(backup, target);
        else unlinkSync(target);
      } catch {
        // Best effort; the pending list removes what is left.
      }
    }
  }
  for (const { temporary } of staged) {
    try {
      unlinkSync(temporary);
    } catch {
      // Renamed into place.
    }
    releasePending(temporary);
  }
  for (const { backup } of done) {
    if (!backup) continue;
    try {
      unlinkSync(backup);
    } catch {
      // Renamed back.
    }
    releasePending(backup);
  }
  if (failure) throw writeFailure(failure.output, failure.error, staged.length);
}
