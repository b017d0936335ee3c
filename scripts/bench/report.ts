// One figure of `npm run bench`: printed as one line the README can quote, and appended to the
// run's JSON file (BENCH_JSON, set by scripts/bench.mjs). Every figure is measured against a
// baseline taken in the same run on the same machine, so the ratio is what carries over.
import { appendFileSync } from 'node:fs';

export interface Figure {
  /** short and stable: "reading post p50", "due list 500 machines p95" */
  name: string;
  value: number;
  unit: string;
  /** what the value is compared with; null for a figure with an absolute target only */
  baseline: { what: string; value: number; unit?: string } | null;
  /** the target in words ("≤ 2×", "≤ 20 s") and whether this run met it */
  target?: string;
  met?: boolean;
}

const digits = (n: number) =>
  Math.abs(n) >= 100 ? n.toFixed(0) : Math.abs(n) >= 10 ? n.toFixed(1) : n.toFixed(2);

/** `bench <name>: <value> <unit> | baseline <value> <unit> | ratio <r>` (+ target when given). */
export function figureLine(f: Figure): string {
  const head = `bench ${f.name}: ${digits(f.value)} ${f.unit}`;
  const base = f.baseline
    ? ` | baseline ${digits(f.baseline.value)} ${f.baseline.unit ?? f.unit} (${f.baseline.what}) | ratio ${ratio(f).toFixed(2)}`
    : ' | baseline — | ratio —';
  const target = f.target
    ? ` | target ${f.target}${f.met === undefined ? '' : f.met ? ' met' : ' NOT met'}`
    : '';
  return head + base + target;
}

export const ratio = (f: Pick<Figure, 'value' | 'baseline'>) =>
  f.baseline && f.baseline.value !== 0 ? f.value / f.baseline.value : Number.NaN;

export function report(f: Figure): void {
  console.log(figureLine(f));
  const file = process.env.BENCH_JSON;
  if (file)
    appendFileSync(file, `${JSON.stringify({ ...f, ratio: f.baseline ? ratio(f) : null })}\n`);
}

/** Median and 95th percentile (nearest rank) of timings in ms. */
export function percentiles(samples: number[]) {
  const s = [...samples].sort((a, b) => a - b);
  const rank = (p: number) => s[Math.min(s.length - 1, Math.max(0, Math.ceil(p * s.length) - 1))];
  return { p50: rank(0.5), p95: rank(0.95), n: s.length };
}
