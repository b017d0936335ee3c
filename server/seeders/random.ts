// A small seeded pseudo-random generator, so the demo scenario comes out the same on every load.
// mulberry32: 32-bit state, fast, good enough for invented data (not for anything secret).

/** A function returning uniform numbers in [0, 1) from a 32-bit seed (mulberry32). */
export function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A 32-bit seed from a text (FNV-1a), so each machine gets its own stable stream. */
export function seedFromString(text: string): number {
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i += 1) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193);
  }
  return hash >>> 0;
}

export interface Random {
  /** uniform in [0, 1) */
  next(): number;
  /** uniform in [min, max) */
  between(min: number, max: number): number;
  /** whole number in [min, max], both included */
  int(min: number, max: number): number;
  /** true with probability p */
  chance(p: number): boolean;
  /** one item of a non-empty list */
  pick<T>(items: readonly T[]): T;
}

/** A seeded Random with the helpers the demo generators use. */
export function createRandom(seed: number): Random {
  const next = mulberry32(seed);
  return {
    next,
    between: (min, max) => min + (max - min) * next(),
    int: (min, max) => min + Math.floor(next() * (max - min + 1)),
    chance: (p) => next() < p,
    pick: (items) => items[Math.floor(next() * items.length)],
  };
}
