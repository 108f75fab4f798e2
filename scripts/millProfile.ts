// An invented hourly profile for the Kestrel Bay Board Mill demo case: a
// seasonal and a daily shape, seeded noise, and a few outages (a boiler
// overhaul, a back-pressure turbine inspection, a lime kiln stop). Demo data only: the
// shapes are plausible, not measured. Regenerate the bundled file with
//   npm run build && node dist/scripts/millProfile.js > cases/profiles/kestrel-bay-year.csv
import { pathToFileURL } from 'node:url';
import { seededRandom as random } from '../src/seededRandom.js';

export interface MillProfileOptions {
  /** hourly rows, from 2026-01-01T00:00 */
  hours: number;
  seed?: number;
}

const COLUMNS = [
  'timestamp', 'dryer_section.steam [t/h]', 'digester.steam [t/h]', 'evaporators.steam [t/h]', 'building_heating.steam [t/h]',
  'tank_tracing.steam [t/h]', 'white_water_heater.heat [MW]', 'kiln_hrsg.steam [t/h]', 'power.site_demand [MW]',
  'power.import.price [EUR/MWh]', 'power.export.price [EUR/MWh]', 'natural_gas.price [EUR/GJ]', 'site.makeup_water.temperature [degC]',
  'site.ambient_temperature [degC]', 'boiler_1.available', 'bpt1.available', 'kiln_hrsg.available',
];

/** Outages as [first hour, hours]. */
const BOILER_1_OVERHAUL: [number, number] = [4512, 240]; // 10 days from 7 July
const BPT1_INSPECTION: [number, number] = [5040, 96]; // 4 days from 30 July
const KILN_STOP: [number, number] = [7200, 48]; // 2 days from 28 October

function within(hour: number, [first, length]: [number, number]): boolean {
  return hour >= first && hour < first + length;
}

export function millProfileCsv(options: MillProfileOptions): string {
  const next = random(options.seed ?? 14);
  const noise = (size: number): number => (next() * 2 - 1) * size;
  const lines = [COLUMNS.join(',')];
  const start = Date.UTC(2026, 0, 1);
  for (let hour = 0; hour < options.hours; hour += 1) {
    const time = new Date(start + hour * 3_600_000);
    const day = hour / 24;
    const clock = time.getUTCHours();
    const weekend = time.getUTCDay() === 0 || time.getUTCDay() === 6;
    // 1 in mid-January, -1 in mid-July
    const winter = Math.cos((2 * Math.PI * (day - 15)) / 365);
    const daytime = clock >= 7 && clock < 19;
    const ambient = 10 - 8 * winter + (daytime ? 3 : -2) + noise(1.5);
    const production = (weekend ? 0.92 : 1) * (1 + noise(0.03));
    const kilnOut = within(hour, KILN_STOP);
    const row = [
      time.toISOString().slice(0, 16),
      (27 * production).toFixed(1),
      (14 * production).toFixed(1),
      (11 * production).toFixed(1),
      Math.max(0.5, 4.9 + 4.1 * winter + (daytime ? -0.6 : 0.6) + noise(0.3)).toFixed(1),
      Math.max(0.6, 1.8 + 0.8 * winter + noise(0.1)).toFixed(1),
      (3 * production).toFixed(2),
      kilnOut ? '0' : (16 + noise(0.8)).toFixed(1),
      (7.5 * production + (daytime ? 0.3 : -0.3)).toFixed(2),
      (104 + 14 * winter + (daytime ? 22 : -18) + noise(6)).toFixed(1),
      (48 + 8 * winter + (daytime ? 12 : -10) + noise(4)).toFixed(1),
      (9.5 + 1.4 * winter + noise(0.1)).toFixed(2),
      (10.5 - 5.5 * winter).toFixed(1),
      ambient.toFixed(1),
      within(hour, BOILER_1_OVERHAUL) ? '0' : '1',
      within(hour, BPT1_INSPECTION) ? '0' : '1',
      kilnOut ? '0' : '1',
    ];
    lines.push(row.join(','));
  }
  return `${lines.join('\n')}\n`;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  process.stdout.write(millProfileCsv({ hours: Number(process.argv[2] ?? 8760) }));
}
