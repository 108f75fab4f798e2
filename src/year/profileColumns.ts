// A profile's column names, "<id>.<field> [unit]", turned into the case value
// each column sets and how a cell becomes an internal (SI) number. The forms
// are documented in the case schema (profile.file) and the README.
import { parseQuantity, type QuantityKind } from '../units/index.js';
import type { Plant } from '../model/index.js';

/** Units lists whose items a profile may take out of service. */
export type AvailabilityList = 'boilers' | 'heatRecoveryBoilers' | 'steamImports' | 'turbines' | 'letdowns';

export type ColumnTarget =
  | { kind: 'userSteam'; id: string }
  | { kind: 'userHeat'; id: string }
  | { kind: 'recoverySteam'; id: string }
  | { kind: 'fuelPrice'; id: string }
  | { kind: 'importPrice' }
  | { kind: 'exportPrice' }
  | { kind: 'siteDemand' }
  | { kind: 'makeupTemperature' }
  | { kind: 'ambientTemperature' }
  | { kind: 'available'; id: string; list: AvailabilityList };

export interface ProfileColumn {
  /** the column name as written */
  name: string;
  /** 0-based position in the file's rows */
  position: number;
  /** "<id>.<field>", the key a column is known by */
  key: string;
  target: ColumnTarget;
  /** the quantity a cell holds, null for availability (0 or 1) */
  quantity: QuantityKind | null;
  /** the unit as written, "" for availability */
  unit: string;
  /** internal value = offset + slope x cell (temperatures in degC or degF carry an offset) */
  slope: number;
  offset: number;
}

export type ColumnResult = { ok: true; column: ProfileColumn } | { ok: false; message: string };

/** The columns a period row may carry besides value columns. */
export const PERIOD_COLUMNS = ['timestamp', 'period', 'hours', 'month'] as const;

const FORMS = '<user>.steam [t/h], <user>.heat [MW], <heat recovery boiler>.steam [t/h], <fuel>.price [EUR/GJ], power.import.price, power.export.price, power.site_demand, site.makeup_water.temperature, site.ambient_temperature, or <unit>.available';

const NAME = /^([A-Za-z][A-Za-z0-9_-]*(?:\.[A-Za-z_][A-Za-z0-9_-]*)+)\s*(?:\[([^\]]*)\])?$/;

interface Found {
  target: ColumnTarget;
  quantity: QuantityKind | null;
  /** how the quantity reads in a message */
  words: string;
}

/** Which case value a key such as "dryer_section.steam" names in this plant, or why none. */
function findTarget(plant: Plant, key: string): Found | string {
  const fixed: Record<string, Found> = {
    'power.import.price': { target: { kind: 'importPrice' }, quantity: 'energyPrice', words: 'an energy price such as [EUR/MWh]' },
    'power.export.price': { target: { kind: 'exportPrice' }, quantity: 'energyPrice', words: 'an energy price such as [EUR/MWh]' },
    'power.site_demand': { target: { kind: 'siteDemand' }, quantity: 'power', words: 'a power such as [MW]' },
    'site.makeup_water.temperature': { target: { kind: 'makeupTemperature' }, quantity: 'temperature', words: 'a temperature such as [degC]' },
    'site.ambient_temperature': { target: { kind: 'ambientTemperature' }, quantity: 'temperature', words: 'a temperature such as [degC]' },
  };
  if (fixed[key]) return fixed[key];
  const dot = key.indexOf('.');
  const id = key.slice(0, dot);
  const field = key.slice(dot + 1);
  const inList = (list: { id: string }[]): boolean => list.some((item) => item.id === id);
  if (inList(plant.users) && field === 'steam') return { target: { kind: 'userSteam', id }, quantity: 'massFlow', words: 'a mass flow such as [t/h]' };
  if (inList(plant.users) && field === 'heat') return { target: { kind: 'userHeat', id }, quantity: 'power', words: 'a power such as [MW]' };
  if (inList(plant.heatRecoveryBoilers) && field === 'steam') return { target: { kind: 'recoverySteam', id }, quantity: 'massFlow', words: 'a mass flow such as [t/h]' };
  if (inList(plant.fuels) && field === 'price') return { target: { kind: 'fuelPrice', id }, quantity: 'energyPrice', words: 'an energy price such as [EUR/GJ]' };
  const lists: [AvailabilityList, { id: string }[]][] = [
    ['boilers', plant.boilers], ['heatRecoveryBoilers', plant.heatRecoveryBoilers], ['steamImports', plant.steamImports], ['turbines', plant.turbines], ['letdowns', plant.letdowns],
  ];
  const list = lists.find(([, items]) => inList(items));
  if (list && field === 'available') return { target: { kind: 'available', id, list: list[0] }, quantity: null, words: 'no unit (cells 0 or 1)' };
  const known = [plant.users, plant.heatRecoveryBoilers, plant.fuels, ...lists.map(([, items]) => items)].some(inList);
  if (known) return `"${field}" of "${id}" is not a value a profile can set; expected one of ${FORMS}`;
  return `no unit or fuel "${id}" in the case; expected one of ${FORMS}`;
}

/** Reads one value column's name against the plant; currency is the site's. */
export function readColumn(plant: Plant, name: string, position: number): ColumnResult {
  const match = NAME.exec(name.trim());
  if (!match) return { ok: false, message: `expected a column named "timestamp", "period", "hours", "month" or "<id>.<field> [unit]" (such as "dryer_section.steam [t/h]"), found "${name}"` };
  const key = match[1];
  const unit = (match[2] ?? '').trim();
  const found = findTarget(plant, key);
  if (typeof found === 'string') return { ok: false, message: found };
  const base = { name, position, key, target: found.target, quantity: found.quantity, unit };
  if (found.quantity === null) {
    if (unit !== '') return { ok: false, message: `expected no unit for "${key}" (cells 0 or 1), found [${unit}]` };
    return { ok: true, column: { ...base, slope: 1, offset: 0 } };
  }
  if (unit === '') return { ok: false, message: `expected the unit in brackets after "${key}": ${found.words}, found none` };
  const options = { atmosphericPressure_MPa: plant.site.atmosphericPressure };
  const one = parseQuantity(`1 ${unit}`, found.quantity, options);
  const two = parseQuantity(`2 ${unit}`, found.quantity, options);
  if (!one.ok || !two.ok) return { ok: false, message: `expected ${found.words} for "${key}", found [${unit}]` };
  if (one.currency !== undefined && one.currency !== plant.site.currency) {
    return { ok: false, message: `expected a price in ${plant.site.currency} (the site currency) for "${key}", found [${unit}] in ${one.currency}` };
  }
  const slope = two.value - one.value;
  return { ok: true, column: { ...base, slope, offset: one.value - slope } };
}
