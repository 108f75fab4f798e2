// Every command that reads a case loads it the same way: the located issues on
// stderr, errors first, and one closing line saying nothing was done.
import { formatIssue, loadCase } from '../model/index.js';
import { CliError, EXIT_PROBLEMS } from './errors.js';

export type LoadedCase = Extract<Awaited<ReturnType<typeof loadCase>>, { ok: true }>;

/** The loaded case, or a CliError (exit 1) after printing every issue; `outcome` ends the closing line. */
export async function loadCaseOrFail(path: string, outcome = 'nothing was solved'): Promise<LoadedCase> {
  const loaded = await loadCase(path);
  if (loaded.ok) return loaded;
  const errors = loaded.issues.filter((issue) => issue.severity === 'error');
  for (const issue of loaded.issues) process.stderr.write(`${formatIssue(issue, path)}\n`);
  throw new CliError(`${path}: ${errors.length} error${errors.length === 1 ? '' : 's'}; ${outcome}`, EXIT_PROBLEMS);
}
