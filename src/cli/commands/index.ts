// Every command of the steamwright CLI, in the order `--help` lists them.
import type { CommandModule } from 'yargs';
import { checkCommand } from './check.js';
import { compareCommand } from './compare.js';
import { evaluateCommand } from './evaluate.js';
import { initCommand } from './init.js';
import { reportCommand } from './report.js';
import { solveCommand } from './solve.js';
import { stateCommand } from './state.js';
import { watchCommand } from './watch.js';
import { reconcileCommand } from './reconcile.js';
import { savingsCommand } from './savings.js';
import { yearCommand } from './year.js';

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export const commands: CommandModule<any, any>[] = [solveCommand, compareCommand, evaluateCommand, savingsCommand, yearCommand, reportCommand, watchCommand, checkCommand, initCommand, stateCommand, reconcileCommand];
