const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

export interface MergeResult<T> {
  values: T;
  /** Fields that both the person and someone else changed; the person's text was kept. */
  overlapping: (keyof T)[];
}

/**
 * Re-apply one person's edits on top of the latest saved record, field by field:
 * a field they changed keeps their value, every other field takes the latest one.
 */
export function mergeChanges<T extends Record<string, unknown>>(base: T, mine: T, latest: T): MergeResult<T> {
  const values = { ...latest };
  const overlapping: (keyof T)[] = [];
  for (const key of Object.keys(mine) as (keyof T)[]) {
    if (same(mine[key], base[key])) continue;
    values[key] = mine[key];
    if (!same(latest[key], base[key]) && !same(latest[key], mine[key])) overlapping.push(key);
  }
  return { values, overlapping };
}
