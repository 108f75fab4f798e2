// `steamwright watch CASE`: the report served on 127.0.0.1, redrawn when the case is saved.
import type { Argv, CommandModule } from 'yargs';
import type { BackendName } from '../../lp/index.js';
import { CliError, EXIT_USAGE } from '../errors.js';
import { WatchServer } from '../watch/watchServer.js';
import { OBJECTIVE_WORDS } from './solve.js';

interface WatchArgs {
  case: string;
  port: number;
  scenario?: string;
  objective?: string;
  solver: BackendName;
  readings?: string;
  year: boolean;
}

export const watchCommand: CommandModule<object, WatchArgs> = {
  command: 'watch <case>',
  describe: 'Serve the report of a case on this machine (127.0.0.1) and redraw it whenever the case (or its readings or profile) is saved',
  builder: (yargs: Argv<object>) =>
    yargs
      .positional('case', { type: 'string', demandOption: true, describe: 'the plant case file (YAML)' })
      .option('port', { type: 'number', default: 0, describe: 'port on 127.0.0.1 (default 0: one the system chooses, printed)' })
      .option('scenario', { type: 'string', describe: 'show this scenario of the case instead of the plant as written and all scenarios' })
      .option('objective', { choices: Object.keys(OBJECTIVE_WORDS), describe: 'overrides the case objective' })
      .option('solver', { choices: ['highs', 'jslp'] as const, default: 'highs' as BackendName, describe: 'LP/MIP solver backend' })
      .option('readings', { type: 'string', describe: 'also reconcile the meters against this readings CSV, redrawn when it is saved' })
      .option('year', { type: 'boolean', default: false, describe: 'also solve the year of the case\'s profile, again when the case or the profile is saved (a long profile takes minutes)' })
      .check((args) => {
        if (!Number.isInteger(args.port) || args.port < 0 || args.port > 65535) throw new CliError(`--port: expected a whole number from 0 to 65535, found ${String(args.port)}`, EXIT_USAGE);
        return true;
      })
      .example('$0 watch cases/millbrook-creamery.yaml', 'open the printed address; save the case to redraw')
      .example('$0 watch cases/kestrel-bay-board-mill.yaml --scenario winter --port 8750', 'one scenario, on a fixed port')
      .example('$0 watch cases/millbrook-creamery.yaml --readings cases/millbrook-creamery.readings.csv', 'with the meters, redrawn when either file is saved') as Argv<WatchArgs>,
  handler: async (args) => {
    const server = new WatchServer({
      casePath: args.case,
      port: args.port,
      request: { scenario: args.scenario, objective: args.objective ? OBJECTIVE_WORDS[args.objective] : undefined, solver: args.solver, workers: 1 },
      log: (line) => process.stderr.write(`${line}\n`),
      ...(args.readings !== undefined ? { readingsPath: args.readings } : {}),
      year: args.year,
    });
    let url: string;
    try {
      url = await server.start();
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      if (code === 'EADDRINUSE') throw new CliError(`--port ${args.port}: that port on 127.0.0.1 is in use; choose another, or 0 for any free one`, EXIT_USAGE);
      if (code === 'EACCES') throw new CliError(`--port ${args.port}: not allowed to listen there; choose one above 1023, or 0 for any free one`, EXIT_USAGE);
      throw error;
    }
    process.stdout.write(`serving ${url} (this machine only); watching ${[args.case, ...(args.readings !== undefined ? [args.readings] : [])].join(' and ')}${args.year ? ' and the case\'s profile' : ''}; Ctrl-C stops\n`);
    await new Promise<void>((done) => {
      const stop = (): void => {
        process.off('SIGINT', stop);
        process.off('SIGTERM', stop);
        void server.stop().then(done);
      };
      process.on('SIGINT', stop);
      process.on('SIGTERM', stop);
    });
  },
};
