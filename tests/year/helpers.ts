// Shared by the year tests: the mill case without its scenarios, projects,
// sweeps and profile, and a profile read from text against it.
import { readFileSync } from 'node:fs';
import { loadCaseText, type Plant } from '../../src/model/index.js';
import { readProfile, type Profile } from '../../src/year/index.js';

const millText = readFileSync(new URL('../../cases/kestrel-bay-board-mill.yaml', import.meta.url), 'utf8');

/** The mill as written up to its scenarios, so other sections can be appended. */
export const millBase = millText.slice(0, millText.indexOf('# Scenarios:'));

export function loadPlant(text: string): Plant {
  const loaded = loadCaseText(text, 'mill.yaml');
  if (!loaded.ok) throw new Error(`case should load: ${loaded.issues.map((issue) => `${issue.line}: ${issue.message}`).join('; ')}`);
  return loaded.plant;
}

export function profileOf(plant: Plant, text: string): Profile {
  const read = readProfile(plant, text, 'profile.csv', { file: 'profile.csv', hours: null, line: 1, column: 1, hoursLine: 1, hoursColumn: 1 }, 'mill.yaml');
  if (!read.ok) throw new Error(`profile should read: ${read.issues.map((issue) => `${issue.line}:${issue.column} ${issue.message}`).join('; ')}`);
  return read.profile;
}
