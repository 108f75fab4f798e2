// `steamwright init FILE`: a commented starter case, never over an existing file.
import { link, unlink, writeFile } from 'node:fs/promises';
import { dirname, relative, sep } from 'node:path';
import type { Argv, CommandModule } from 'yargs';
import { schemaFilePath, starterCase, type StarterUnits } from '../../model/index.js';
import { CliError, EXIT_USAGE } from '../errors.js';
import { temporaryName } from '../outputFiles.js';
import { holdPending, releasePending } from '../pendingFiles.js';

interface InitArgs {
  file: string;
  units: StarterUnits;
}

function errorCode(error: unknown): string | undefined {
  return (error as NodeJS.ErrnoException).code;
}

function folderProblem(code: string | undefined, folder: string): string {
  if (code === 'ENOENT') return `the folder ${folder} does not exist`;
  if (code === 'ENOTDIR') return `${folder} is not a folder`;
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  if (code === 'EROFS') return 'the file system is read-only';
  if (code === 'ENOSPC') return 'no space left on the device';
  if (code === 'ENAMETOOLONG') return 'the name is too long';
  if (code === 'EISDIR') return 'it is a folder';
  return `the system refused (${code ?? 'unknown error'})`;
}

export const initCommand: CommandModule<object, InitArgs> = {
  command: 'init <file>',
  describe: 'Write a commented starter case file (never overwrites)',
  builder: (yargs: Argv<object>) =>
    yargs
      .positional('file', { type: 'string', demandOption: true, describe: 'the case file to create' })
      .option('units', { choices: ['si', 'us'] as const, default: 'si' as const, describe: 'unit system of the starter: si (barg, degC, t/h, EUR) or us (psig, degF, klb/h, USD)' })
      .example('$0 init plant.yaml', 'start a new case in SI units')
      .example('$0 init plant.yaml --units us', 'the same starter in US units') as Argv<InitArgs>,
  handler: async (args) => {
    const target = args.file;
    if (target.trim() === '') throw new CliError('init needs a file name, found an empty one', EXIT_USAGE);
    const folder = dirname(target);
    const schema = relative(folder, schemaFilePath()).split(sep).join('/');
    const temporary = temporaryName(target);
    holdPending(temporary);
    try {
      await writeFile(temporary, starterCase(schema, args.units), { flag: 'wx' });
    } catch (error) {
      releasePending(temporary);
      await unlink(temporary).catch(() => undefined);
      throw new CliError(`cannot write ${target}: ${folderProblem(errorCode(error), folder)}`, EXIT_USAGE);
    }
    try {
      // link() refuses an existing target, so a file created meanwhile is never overwritten.
      await link(temporary, target);
    } catch (error) {
      const code = errorCode(error);
      if (code === 'EEXIST') throw new CliError(`${target} already exists; choose another name or remove it first`, EXIT_USAGE);
      throw new CliError(`cannot write ${target}: ${folderProblem(code, folder)}`, EXIT_USAGE);
    } finally {
      await unlink(temporary).catch(() => undefined);
      releasePending(temporary);
    }
    process.stdout.write(`wrote ${target}; edit it, then run: npx steamwright check ${target}\n`);
  },
};
