// A PATCH sends only what the person changed: a field left alone is never written back, so an
// edit cannot undo what someone else (or the server) changed meanwhile, nor round a value.

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** The fields of `values` that differ from `initial` (compared as JSON). */
export function changedFields<T extends object>(initial: T, values: T): Partial<T> {
  const changed: Partial<T> = {};
  for (const key of Object.keys(values) as (keyof T)[]) {
    if (!same(initial[key], values[key])) changed[key] = values[key];
  }
  return changed;
}
