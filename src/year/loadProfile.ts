// The case's profile file read from disk, relative to the case, with a bound
// on its size; every failure is a located issue, never a throw.
import { readFile, stat } from 'node:fs/promises';
import path from 'node:path';
import type { Plant } from '../model/index.js';
import { readProfile, type ProfileIssue, type ProfileRead } from './readProfile.js';

/** A year of hourly rows with twenty columns is under 2 MB; this leaves ample room. */
export const MAX_PROFILE_BYTES = 50_000_000;

export async function loadProfile(plant: Plant, casePath: string): Promise<ProfileRead & { file?: string }> {
  const reference = plant.profile;
  if (!reference) {
    return { ok: false, issues: [{ file: casePath, line: 0, column: 0, message: 'the case names no profile; expected "profile: { file: year.csv }" naming a CSV of periods (see the README, "A year of operation")' }] };
  }
  const where: ProfileIssue = { file: casePath, line: reference.line, column: reference.column, message: '' };
  const file = path.join(path.dirname(casePath), reference.file);
  try {
    const info = await stat(file);
    if (info.isDirectory()) return { ok: false, issues: [{ ...where, message: `profile.file: expected a CSV file, found a directory at ${file}` }] };
    if (info.size > MAX_PROFILE_BYTES) return { ok: false, issues: [{ ...where, message: `profile.file: expected a CSV of at most ${MAX_PROFILE_BYTES / 1e6} MB, found ${(info.size / 1e6).toFixed(1)} MB in ${file}` }] };
    const text = await readFile(file, 'utf8');
    return { ...readProfile(plant, text, file, reference, casePath), file };
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EACCES' || code === 'EPERM' ? 'permission denied' : 'it cannot be read';
    return { ok: false, issues: [{ ...where, message: `profile.file: cannot read ${file}: ${why}` }] };
  }
}
