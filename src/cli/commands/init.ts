// `steamwright init FILE`: a commented starter case, never over an existing file.
import { link, unlink, writeFile } from 'node:fs/promises';
import { basename, dirname, join, relative, sep } from 'node:path';
import type { Argv, CommandModule } from 'yargs';
import { schemaFilePath, starterCase } from '../../model/index.js';
import { CliError, EXIT_USAGE } from '../errors.js';

interface InitArgs {
  file: string;
}

function errorCode(error: unknown): string | undefined {
  return (error as NodeJS.ErrnoException).code;
}

export const initCommand: CommandModule<object, InitArgs> = {
  command: 'init <file>',
  describe: 'Write a commented starter case file (never overwrites)',
  builder: (yargs: Argv<object>) =>
    yargs
      .positional('file', { type: 'string', demandOption: true, describe: 'the case file to create' })
      .example('$0 init plant.yaml', 'start a new case') as Argv<InitArgs>,
  handler: async (args) => {
    const target = args.file;
    const folder = dirname(target);
    const schema = relative(folder, schemaFilePath()).split(sep).join('/');
    const temporary = join(folder, `.${basename(target)}.${process.pid}.tmp`);
    try {
      await writeFile(temporary, starterCase(schema), { flag: 'wx' });
    } catch (error) {
      const code = errorCode(error);
      if (code === 'ENOENT') throw new CliError(`cannot write ${target}: the folder ${folder} does not exist`, EXIT_USAGE);
      if (code === 'EACCES' || code === 'EROFS') throw new CliError(`cannot write ${target}: permission denied`, EXIT_USAGE);
      throw error;
    }
    try {
      // link() refuses an existing target, so a file created meanwhile is never overwritten.
      await link(temporary, target);
    } catch (error) {
      if (errorCode(error) === 'EEXIST') throw new CliError(`${target} already exists; choose another name or remove it first`, EXIT_USAGE);
      throw new CliError(`cannot write ${target}: ${(error as Error).message}`, EXIT_USAGE);
    } finally {
      await unlink(temporary).catch(() => undefined);
    }
    process.stdout.write(`wrote ${target}; edit it, then run: steamwright check ${target}\n`);
  },
};
