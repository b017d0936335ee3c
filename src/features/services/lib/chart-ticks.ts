/** About `count` ticks on round steps (1, 2, 2.5 or 5 × 10ⁿ) covering [min, max]. */
export function roundTicks(min: number, max: number, count: number): number[] {
  const raw = Math.max(max - min, 1e-6) / Math.max(count - 1, 1);
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((f) => f * magnitude).find((s) => s >= raw) ?? raw;
  const ticks: number[] = [];
  for (let v = Math.floor(min / step) * step; v < max + step; v += step) {
    ticks.push(Number(v.toFixed(6)));
    if (v >= max) break;
  }
  return ticks;
}
