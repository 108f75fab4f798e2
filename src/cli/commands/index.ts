// Every command of the steamwright CLI, in the order `--help` lists them.
import type { CommandModule } from 'yargs';
import { stateCommand } from './state.js';

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export const commands: CommandModule<any, any>[] = [stateCommand];
