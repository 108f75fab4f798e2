// Switching rules checked against the profile: a minimum running or stopped
// time longer than the whole profile could never be met, so it is refused at
// its place in the case.
import type { Plant } from '../model/index.js';
import type { Profile, ProfileIssue } from './readProfile.js';
import { ruledUnits } from './switchingUnits.js';

export function switchingIssues(plant: Plant, profile: Profile, caseFile: string): ProfileIssue[] {
  const units = ruledUnits(plant);
  if (units.length === 0) return [];
  let hours = 0;
  for (let at = 0; at < profile.hours.length; at += 1) hours += profile.hours[at];
  const issues: ProfileIssue[] = [];
  for (const unit of units) {
    for (const key of ['min_hours_on', 'min_hours_off'] as const) {
      const value = key === 'min_hours_on' ? unit.rules.minHoursOn : unit.rules.minHoursOff;
      if (value <= hours) continue;
      const at = unit.rules.at[key];
      issues.push({ file: caseFile, line: at.line, column: at.column, message: `${unit.kind} ${unit.id} switching.${key}: expected at most the profile's ${hours} h, found ${value} h: a ${key === 'min_hours_on' ? 'run' : 'stop'} that long could never end within the year` });
    }
  }
  return issues;
}
