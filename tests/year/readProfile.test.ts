// readProfile: every problem in a profile located as file:line:column with
// what was expected and what was found, all at once; good files read into
// internal units.
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { loadCaseText, type Plant, type ProfileReference } from '../../src/model/index.js';
import { formatProfileIssue, readProfile } from '../../src/year/index.js';
import { expectClose } from '../helpers/expectClose.js';

const millText = readFileSync(new URL('../../cases/kestrel-bay-board-mill.yaml', import.meta.url), 'utf8');
const loaded = loadCaseText(millText, 'mill.yaml');
if (!loaded.ok) throw new Error('the mill case should load');
const mill: Plant = loaded.plant;
const noHours: ProfileReference = { file: 'p.csv', hours: null, line: 3, column: 9, hoursLine: 3, hoursColumn: 9 };

function problems(text: string, reference = noHours): string[] {
  const read = readProfile(mill, text, 'p.csv', reference, 'mill.yaml');
  return read.ok ? [] : read.issues.map(formatProfileIssue);
}

describe('readProfile', () => {
  test('the mill case names its bundled profile with the hours it covers', () => {
    expect(mill.profile).toMatchObject({ file: 'profiles/kestrel-bay-year.csv', hours: 8760 });
  });

  test('hourly rows read into internal units: t/h to kg/s, degC to K, EUR/MWh kept per GJ', () => {
    const read = readProfile(mill, 'timestamp,dryer_section.steam [t/h],site.makeup_water.temperature [degC],power.import.price [EUR/MWh],boiler_1.available\n2026-03-01T00:00,36,10,90,1\n2026-03-01T01:00,18,10.5,72,0\n', 'p.csv', noHours, 'mill.yaml');
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    const { profile } = read;
    expect(profile.kind).toBe('hourly');
    expect(profile.labels).toEqual(['2026-03-01T00:00', '2026-03-01T01:00']);
    expect(Array.from(profile.months)).toEqual([3, 3]);
    expect(Array.from(profile.hours)).toEqual([1, 1]);
    // 36 t/h = 10 kg/s; 10 degC = 283.15 K; 90 EUR/MWh = 25 EUR/GJ (1 MWh = 3.6 GJ, exact)
    expectClose(profile.values[0], 10, 1e-12, 'dryer steam');
    expectClose(profile.values[1], 283.15, 1e-12, 'makeup temperature');
    expectClose(profile.values[2], 25, 1e-12, 'import price');
    expect(profile.values[3]).toBe(1);
    expect(profile.values[7]).toBe(0);
  });

  test('periods with hours and months, in US units where the column says so', () => {
    const read = readProfile(mill, 'period,hours,month,dryer_section.steam [klb/h],white_water_heater.heat [MMBtu/h]\nwinter,2000,1,50,10\nsummer,1500.5,7,40,8\n', 'p.csv', noHours, 'mill.yaml');
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.profile.kind).toBe('periods');
    expect(Array.from(read.profile.hours)).toEqual([2000, 1500.5]);
    expect(Array.from(read.profile.months)).toEqual([1, 7]);
    // 1 lb = 0.45359237 kg exactly: 50 klb/h = 50 x 453.59237 / 3600 kg/s
    expectClose(read.profile.values[0], (50 * 453.59237) / 3600, 1e-12, 'klb/h');
    // 1 Btu (IT) = 1.05505585262 kJ: 10 MMBtu/h = 1.05505585262e7 / 3600 kW
    expectClose(read.profile.values[1], 1.05505585262e7 / 3600, 1e-9, 'MMBtu/h');
  });

  test('the header row: unknown ids and fields, missing or wrong units, wrong currency, repeats, all at once', () => {
    expect(problems('timestamp,dryer.steam [t/h],dryer_section.flow [t/h],dryer_section.steam,dryer_section.steam [MW],power.import.price [USD/MWh],boiler_1.available [t/h],natural_gas.price [EUR/GJ],natural_gas.price [EUR/MWh],timestamp\n2026-01-01T00:00,1,1,1,1,1,1,1,1,x\n')).toMatchInlineSnapshot(`
      [
        "p.csv:1:2  no unit or fuel "dryer" in the case; expected one of <user>.steam [t/h], <user>.heat [MW], <heat recovery boiler>.steam [t/h], <fuel>.price [EUR/GJ], power.import.price, power.export.price, power.site_demand, site.makeup_water.temperature, site.ambient_temperature, or <unit>.available",
        "p.csv:1:3  "flow" of "dryer_section" is not a value a profile can set; expected one of <user>.steam [t/h], <user>.heat [MW], <heat recovery boiler>.steam [t/h], <fuel>.price [EUR/GJ], power.import.price, power.export.price, power.site_demand, site.makeup_water.temperature, site.ambient_temperature, or <unit>.available",
        "p.csv:1:4  expected the unit in brackets after "dryer_section.steam": a mass flow such as [t/h], found none",
        "p.csv:1:5  expected a mass flow such as [t/h] for "dryer_section.steam", found [MW]",
        "p.csv:1:6  expected a price in EUR (the site currency) for "power.import.price", found [USD/MWh] in USD",
        "p.csv:1:7  expected no unit for "boiler_1.available" (cells 0 or 1), found [t/h]",
        "p.csv:1:9  "natural_gas.price" is already set by column 8; expected each case value in one column",
        "p.csv:1:10  column "timestamp" appears twice (also column 1); expected it once",
      ]
    `);
  });

  test('a file with neither timestamps nor periods, and one with both', () => {
    expect(problems('dryer_section.steam [t/h]\n30\n')).toEqual(['p.csv:1:1  expected a "timestamp" column (hourly rows) or "period" and "hours" columns, found neither']);
    expect(problems('timestamp,period,hours\n2026-01-01T00:00,a,1\n')[0]).toBe('p.csv:1:1  expected either a "timestamp" column (hourly rows) or "period" and "hours" columns, found both');
  });

  test('bad cells: not numbers, empty, out of range, availability not 0 or 1, short rows; every one located', () => {
    const text = [
      'timestamp,dryer_section.steam [t/h],site.makeup_water.temperature [degC],boiler_1.available',
      '2026-01-01T00:00,thirty,10,1',
      '2026-01-01T01:00,,10,1',
      '2026-01-01T02:00,-4,120,0.5',
      '2026-01-01T03:00,30,10',
      '2026-01-01T04:00,30,10,1',
    ].join('\n');
    expect(problems(text)).toMatchInlineSnapshot(`
      [
        "p.csv:2:2  dryer_section.steam: expected a number in t/h, found "thirty"",
        "p.csv:3:2  dryer_section.steam: expected a number in t/h, found an empty cell",
        "p.csv:4:2  dryer_section.steam: expected zero or more, found "-4" in t/h",
        "p.csv:4:3  site.makeup_water.temperature: expected a makeup water temperature above 0 degC and below 100 degC, found "120" in degC",
        "p.csv:4:4  boiler_1.available: expected 1 (in service) or 0 (out of service), found "0.5"",
        "p.csv:5  expected 4 cells as in the header row, found 3",
      ]
    `);
  });

  test('timestamps: a gap, a duplicate, a step back and a bad stamp, each against the row above', () => {
    const text = [
      'timestamp,dryer_section.steam [t/h]',
      '2026-01-01T00:00,30',
      '2026-01-01T01:00,30',
      '2026-01-01T04:00,30',
      '2026-01-01T04:00,30',
      '2026-01-01T02:00,30',
      '2026-02-30T00:00,30',
      '2026-01-01 05:30,30',
    ].join('\n');
    expect(problems(text)).toMatchInlineSnapshot(`
      [
        "p.csv:4:1  timestamp: expected 2026-01-01T02:00, one hour after line 3, found 2026-01-01T04:00 (a gap of 2 h)",
        "p.csv:5:1  timestamp: expected 2026-01-01T05:00, one hour after line 4, found the same hour again (a duplicate)",
        "p.csv:6:1  timestamp: expected 2026-01-01T05:00, one hour after line 5, found 2026-01-01T02:00, earlier (rows must run forward in time)",
        "p.csv:7:1  timestamp: expected an hour such as "2026-01-01T00:00" (YYYY-MM-DDTHH:00, local standard time), found "2026-02-30T00:00"",
        "p.csv:8:1  timestamp: expected an hour such as "2026-01-01T00:00" (YYYY-MM-DDTHH:00, local standard time), found "2026-01-01 05:30"",
      ]
    `);
  });

  test('rows that do not cover the hours the case declares are located at profile.hours in the case', () => {
    const reference: ProfileReference = { ...noHours, hours: 3, hoursLine: 12, hoursColumn: 10 };
    expect(problems('timestamp,dryer_section.steam [t/h]\n2026-01-01T00:00,30\n2026-01-01T01:00,30\n', reference)).toEqual([
      "mill.yaml:12:10  profile.hours: expected the profile's 2 rows to cover 3 h, found 2 h in p.csv",
    ]);
    expect(problems('period,hours,dryer_section.steam [t/h]\na,2,30\nb,0,30\nc,x,30\n')).toEqual([
      'p.csv:3:2  hours: expected the hours this period stands for, more than 0 and at most 8784, found "0"',
      'p.csv:4:2  hours: expected the hours this period stands for, more than 0 and at most 8784, found "x"',
    ]);
  });

  test('malformed CSV (an unclosed quote) is one located problem, not a crash', () => {
    expect(problems('timestamp,dryer_section.steam [t/h]\n2026-01-01T00:00,"30\n')).toHaveLength(1);
    expect(problems('timestamp,dryer_section.steam [t/h]\n2026-01-01T00:00,"30\n')[0]).toMatch(/^p\.csv:2 {2}expected CSV/);
  });

  test('the bundled mill profile reads without a problem and covers 8760 h', () => {
    const text = readFileSync(new URL('../../cases/profiles/kestrel-bay-year.csv', import.meta.url), 'utf8');
    const read = readProfile(mill, text, 'kestrel-bay-year.csv', mill.profile!, 'mill.yaml');
    expect(read.ok ? [] : read.issues.slice(0, 3).map(formatProfileIssue)).toEqual([]);
    if (read.ok) expect(read.profile.labels).toHaveLength(8760);
  });
});
