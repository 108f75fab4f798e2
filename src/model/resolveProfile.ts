// The case's `profile`: the CSV file of the year's periods, as written, with
// where the case names it (src/year reads the file; messages about the whole
// file point back here).
import { locate } from './yamlSource.js';
import type { ProfileReference } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';

/** Most hours a profile may declare: a leap year. */
export const MOST_PROFILE_HOURS = 8784;

export function resolveProfile(context: ResolveContext): ProfileReference | undefined {
  const file = context.raw(['profile', 'file']);
  if (typeof file !== 'string') return undefined; // absent, or the schema reports it
  if (file.trim() === '') {
    context.error('bad-profile', ['profile', 'file'], 'expected the name of a CSV file, relative to the case, found an empty name');
    return undefined;
  }
  const hours = context.raw(['profile', 'hours']);
  const at = locate(context.source, ['profile', 'file']);
  const hoursAt = locate(context.source, ['profile', 'hours']);
  return {
    file,
    hours: typeof hours === 'number' ? hours : null,
    line: at.line,
    column: at.column,
    hoursLine: typeof hours === 'number' ? hoursAt.line : at.line,
    hoursColumn: typeof hours === 'number' ? hoursAt.column : at.column,
  };
}
