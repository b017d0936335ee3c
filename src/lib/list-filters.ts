/**
 * A list's filters as a page holds them, derived from the server's query schema (its `z.infer`),
 * so a new choice on the server is a type error here rather than a silent mismatch: every field
 * is set, and the `Unset` ones hold null for "any" (the URL leaves them out).
 */
export type ListFilters<Query, Unset extends keyof Query = never> = {
  [K in Exclude<keyof Query, Unset>]-?: Exclude<Query[K], undefined>;
} & { [K in Unset]-?: Exclude<Query[K], undefined> | null };
