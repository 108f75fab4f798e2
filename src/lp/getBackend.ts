import type { SolverBackend } from './backend.js';
import { highsBackend } from './highsBackend.js';
import { jslpBackend } from './jslpBackend.js';

export type BackendName = 'highs' | 'jslp';

export const backendNames: readonly BackendName[] = ['highs', 'jslp'];

/** A backend by name; 'highs' is the default. */
export function getBackend(name: BackendName = 'highs'): SolverBackend {
  if (name === 'highs') return highsBackend;
  if (name === 'jslp') return jslpBackend;
  throw new Error(`Solver "${String(name)}" is not known; choose one of ${backendNames.join(', ')}.`);
}
