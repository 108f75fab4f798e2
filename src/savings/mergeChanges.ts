// Several overlays as one: what the roadmap applies at each step. Lists of
// items merge by id (a later measure's keys win), `add` lists append,
// `disable` lists join, maps merge key by key.
type Raw = Record<string, unknown>;

function isMap(value: unknown): value is Raw {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

function mergeById(earlier: unknown[], later: unknown[]): unknown[] {
  const merged = earlier.map((item) => (isMap(item) ? { ...item } : item));
  for (const item of later) {
    const index = isMap(item) ? merged.findIndex((entry) => isMap(entry) && entry.id === item.id) : -1;
    if (index >= 0) merged[index] = mergeMaps(merged[index] as Raw, item as Raw);
    else merged.push(item);
  }
  return merged;
}

function mergeMaps(earlier: Raw, later: Raw): Raw {
  const merged: Raw = { ...earlier };
  for (const [key, value] of Object.entries(later)) {
    const before = merged[key];
    if (isMap(before) && isMap(value)) merged[key] = mergeMaps(before, value);
    else merged[key] = value;
  }
  return merged;
}

export function mergeChanges(overlays: readonly Raw[]): Raw {
  let merged: Raw = {};
  for (const overlay of overlays) {
    for (const [key, value] of Object.entries(overlay)) {
      const before = merged[key];
      if (key === 'add' && isMap(before) && isMap(value)) {
        const add: Raw = { ...before };
        for (const [list, items] of Object.entries(value)) add[list] = [...((add[list] as unknown[]) ?? []), ...(items as unknown[])];
        merged = { ...merged, add };
      } else if (key === 'disable' && Array.isArray(before) && Array.isArray(value)) {
        merged = { ...merged, disable: [...new Set([...before, ...value])] };
      } else if (Array.isArray(before) && Array.isArray(value)) {
        merged = { ...merged, [key]: mergeById(before, value) };
      } else if (isMap(before) && isMap(value)) {
        merged = { ...merged, [key]: mergeMaps(before, value) };
      } else {
        merged = { ...merged, [key]: value };
      }
    }
  }
  return merged;
}
