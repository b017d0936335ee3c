import { formatLocalDate } from '../../lib/format';

const hours = new Intl.NumberFormat(undefined, { maximumFractionDigits: 2 });

/** Labour hours as the outlook writes them: "2.5 h". */
export const formatOutlookHours = (n: number) => `${hours.format(n)} h`;

/** "W49" of "2026-W49". */
export const weekNumber = (isoWeek: string) => isoWeek.slice(5);

/** "Week 49 · 30 Nov – 6 Dec" (the dates in the reader's way of writing them). */
export const weekTitle = (w: { isoWeek: string; start: string; end: string }) =>
  `Week ${Number(w.isoWeek.slice(6))} · ${formatLocalDate(w.start)} – ${formatLocalDate(w.end)}`;

/** "3 services" / "1 service". */
export const countOf = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
