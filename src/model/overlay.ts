// Overlays: a scenario's or project's `changes` merged onto the raw case
// (before resolution), equipment matched by id. The merged data remembers
// where every value was written in the file, so an issue found later in a
// merged value points at the overlay's own line and column.
import type { CasePath } from './issue.js';
import { describeFound } from './issue.js';

/** The top-level lists whose items carry ids; `changes.<list>` merges by id. */
export const OVERLAY_LISTS = [
  'fuels', 'headers', 'boilers', 'heat_recovery_boilers', 'steam_imports', 'turbines', 'letdowns', 'users', 'flash_tanks', 'machines', 'absorption_chillers', 'steam_traps',
] as const;

/** The top-level maps (and the objective) an overlay may change. */
export const OVERLAY_MAPS = ['site', 'power', 'deaerator', 'solver', 'objective'] as const;

/** Keys of the case that never reach a variant's plant. */
const VARIANT_FREE = ['scenarios', 'projects', 'sweeps'];

type Raw = Record<string, unknown>;
export type OverlayReport = (code: string, filePath: CasePath, message: string) => void;

function isMap(value: unknown): value is Raw {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

function isIdList(value: unknown): value is Raw[] {
  return Array.isArray(value) && value.length > 0 && value.every((item) => isMap(item) && typeof item.id === 'string');
}

/**
 * Where each key of a merged container was written. Containers shared
 * unchanged with the file carry no entry: their keys sit under their parent.
 */
export class OverlayOrigins {
  private readonly keyOrigins = new WeakMap<object, Map<string | number, CasePath>>();

  /** The file path of container[key], given the container's own file path. */
  originOf(container: object, key: string | number, containerPath: CasePath): CasePath {
    return this.keyOrigins.get(container)?.get(key) ?? [...containerPath, key];
  }

  record(container: object, origins: Map<string | number, CasePath>): void {
    this.keyOrigins.set(container, origins);
  }

  /** A path into merged data, turned into the path in the file where that value was written. */
  fileOf(data: unknown, path: CasePath): CasePath {
    let current: unknown = data;
    let file: CasePath = [];
    for (const segment of path) {
      file = current !== null && typeof current === 'object' ? this.originOf(current, segment, file) : [...file, segment];
      current = current !== null && typeof current === 'object' ? (current as Record<string | number, unknown>)[segment] : undefined;
    }
    return file;
  }
}

/** The raw case without its scenarios, projects and sweeps: the base of every variant. */
export function variantBase(data: Raw, origins: OverlayOrigins): Raw {
  const base: Raw = {};
  const where = new Map<string | number, CasePath>();
  for (const [key, value] of Object.entries(data)) {
    if (VARIANT_FREE.includes(key)) continue;
    base[key] = value;
    where.set(key, [key]);
  }
  origins.record(base, where);
  return base;
}

/**
 * Merges `changes` (written at changesPath) onto `base` (a variant's raw
 * data, whose own file path is []). Maps merge key by key, lists of items
 * with ids merge by id, other values (and other lists) are replaced; a null
 * value removes an optional key. `disable` removes units by id; `add` appends
 * new items to a list. Unknown ids are reported; the rest still merges.
 */
export function applyOverlay(base: Raw, changes: Raw, changesPath: CasePath, origins: OverlayOrigins, report: OverlayReport): Raw {
  const merge = (target: Raw, targetPath: CasePath, overlay: Raw, overlayPath: CasePath, listName: string | null): Raw => {
    const result: Raw = {};
    const where = new Map<string | number, CasePath>();
    for (const key of Object.keys(target)) {
      result[key] = target[key];
      where.set(key, origins.originOf(target, key, targetPath));
    }
    for (const [key, value] of Object.entries(overlay)) {
      const valuePath = [...overlayPath, key];
      if (listName !== null && key === 'id') continue;
      if (value === null) {
        delete result[key];
        where.delete(key);
        continue;
      }
      const current = result[key];
      if (isMap(value) && isMap(current)) {
        result[key] = merge(current, where.get(key)!, value, valuePath, null);
      } else if (Array.isArray(value) && isIdList(current)) {
        result[key] = mergeList(current, where.get(key)!, value, valuePath, key);
      } else {
        result[key] = value;
        where.set(key, valuePath);
      }
    }
    origins.record(result, where);
    return result;
  };

  const mergeList = (target: Raw[], targetPath: CasePath, overlay: unknown[], overlayPath: CasePath, listName: string): Raw[] => {
    const result = target.slice();
    const where = new Map<string | number, CasePath>(target.map((_, index) => [index, origins.originOf(target, index, targetPath)]));
    overlay.forEach((item, index) => {
      const itemPath = [...overlayPath, index];
      if (!isMap(item) || typeof item.id !== 'string') {
        report('overlay-needs-id', itemPath, `expected the id of the item of ${listName} to change (such as { id: ${String(target[0]?.id)}, ... }), found ${describeFound(isMap(item) ? item.id : item)}`);
        return;
      }
      const at = result.findIndex((existing) => existing.id === item.id);
      if (at < 0) {
        const known = result.map((existing) => String(existing.id)).join(', ');
        report('unknown-overlay-id', [...itemPath, 'id'], `no item with id "${item.id}" in ${listName} to change; known: ${known}. To add one, list it under add: ${listName}`);
        return;
      }
      result[at] = merge(result[at], where.get(at)!, item, itemPath, listName);
    });
    origins.record(result, where);
    return result;
  };

  const { disable, add, ...sections } = changes;
  let merged = merge(base, [], {}, changesPath, null);
  for (const [key, value] of Object.entries(sections)) {
    const valuePath = [...changesPath, key];
    if ((OVERLAY_LISTS as readonly string[]).includes(key)) {
      if (!Array.isArray(value)) continue; // the schema reports it
      const current = merged[key];
      if (!isIdList(current)) {
        value.forEach((item, index) => {
          const id = isMap(item) && typeof item.id === 'string' ? item.id : undefined;
          if (id !== undefined) report('unknown-overlay-id', [...valuePath, index, 'id'], `no item with id "${id}" in ${key} to change: the case has none. To add one, list it under add: ${key}`);
        });
        continue;
      }
      merged = merge(merged, [], { [key]: value }, changesPath, null);
    } else if (value !== undefined) {
      merged = merge(merged, [], { [key]: value }, changesPath, null);
    }
  }
  if (isMap(add)) merged = appendItems(merged, add, [...changesPath, 'add'], origins);
  if (Array.isArray(disable)) merged = removeUnits(merged, disable, [...changesPath, 'disable'], origins, report);
  return merged;
}

function appendItems(data: Raw, add: Raw, addPath: CasePath, origins: OverlayOrigins): Raw {
  const result: Raw = { ...data };
  const where = new Map<string | number, CasePath>(Object.keys(data).map((key) => [key, origins.originOf(data, key, [])]));
  for (const [key, items] of Object.entries(add)) {
    if (!Array.isArray(items)) continue; // the schema reports it
    const current = Array.isArray(data[key]) ? (data[key] as unknown[]) : [];
    const currentPath = where.get(key) ?? [key];
    const listWhere = new Map<string | number, CasePath>(current.map((_, index) => [index, origins.originOf(current, index, currentPath)]));
    items.forEach((_, index) => listWhere.set(current.length + index, [...addPath, key, index]));
    const list = [...current, ...items];
    origins.record(list, listWhere);
    result[key] = list;
    where.set(key, currentPath);
  }
  origins.record(result, where);
  return result;
}

function removeUnits(data: Raw, ids: unknown[], disablePath: CasePath, origins: OverlayOrigins, report: OverlayReport): Raw {
  const result: Raw = { ...data };
  const where = new Map<string | number, CasePath>(Object.keys(data).map((key) => [key, origins.originOf(data, key, [])]));
  ids.forEach((id, index) => {
    if (typeof id !== 'string') return; // the schema reports it
    const key = OVERLAY_LISTS.find((list) => Array.isArray(result[list]) && (result[list] as unknown[]).some((item) => isMap(item) && item.id === id));
    if (key === undefined) {
      report('unknown-overlay-id', [...disablePath, index], `no unit with id "${id}" to disable; expected the id of a boiler, turbine, letdown, user or other listed unit`);
      return;
    }
    const list = result[key] as Raw[];
    const listPath = where.get(key)!;
    const kept: Raw[] = [];
    const keptWhere = new Map<string | number, CasePath>();
    list.forEach((item, at) => {
      if (item.id === id) return;
      keptWhere.set(kept.length, origins.originOf(list, at, listPath));
      kept.push(item);
    });
    origins.record(kept, keptWhere);
    result[key] = kept;
  });
  origins.record(result, where);
  return result;
}
