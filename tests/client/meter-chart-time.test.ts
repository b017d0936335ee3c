// The meter chart's time axis (src/features/machines/lib/meter-chart-time.ts): hand-worked
// instants. Offsets from the IANA zone rules: London is UTC+0 in winter and UTC+1 (BST) from the
// last Sunday of March; Chicago is UTC−6 (CST) in winter and UTC−5 (CDT) in summer.
import { describe, expect, it } from 'vitest';
import { middayOf, timeTicks } from '../../src/features/machines/lib/meter-chart-time';

const utc = (iso: string) => Date.parse(iso);

describe('middayOf', () => {
  it('middayOf — 10 March 2025 in London (GMT) — 12:00 UTC', () => {
    expect(middayOf('2025-03-10', 'Europe/London')).toBe(utc('2025-03-10T12:00:00Z'));
  });
  it('middayOf — 1 July 2025 in London (BST, UTC+1) — 11:00 UTC', () => {
    expect(middayOf('2025-07-01', 'Europe/London')).toBe(utc('2025-07-01T11:00:00Z'));
  });
  it('middayOf — 1 July 2025 in Chicago (CDT, UTC−5) — 17:00 UTC', () => {
    expect(middayOf('2025-07-01', 'America/Chicago')).toBe(utc('2025-07-01T17:00:00Z'));
  });
});

describe('timeTicks', () => {
  const halfYear: [number, number] = [utc('2025-01-15T00:00:00Z'), utc('2025-07-15T00:00:00Z')];

  it('timeTicks — 15 Jan … 15 Jul 2025, UTC, at most 6 — the first of Feb … Jul, each month', () => {
    expect(timeTicks(halfYear, 6, 'UTC').ticks).toEqual([
      utc('2025-02-01T00:00:00Z'),
      utc('2025-03-01T00:00:00Z'),
      utc('2025-04-01T00:00:00Z'),
      utc('2025-05-01T00:00:00Z'),
      utc('2025-06-01T00:00:00Z'),
      utc('2025-07-01T00:00:00Z'),
    ]);
  });
  it('timeTicks — the same six months, at most 3 — every second month: Feb, Apr, Jun', () => {
    // six month starts, step ⌈6 / 3⌉ = 2
    expect(timeTicks(halfYear, 3, 'UTC').ticks).toEqual([
      utc('2025-02-01T00:00:00Z'),
      utc('2025-04-01T00:00:00Z'),
      utc('2025-06-01T00:00:00Z'),
    ]);
  });
  it("timeTicks — in Chicago — months start at the farm's midnight (06:00 UTC in winter)", () => {
    const ticks = timeTicks(halfYear, 6, 'America/Chicago').ticks;
    expect(ticks[0]).toBe(utc('2025-02-01T06:00:00Z'));
    // CDT from 9 March 2025: 1 April starts at 05:00 UTC
    expect(ticks[2]).toBe(utc('2025-04-01T05:00:00Z'));
  });
  it('timeTicks — six days, at most 8 (under a day apart) — one tick at each midday, no date twice', () => {
    const week: [number, number] = [utc('2025-01-01T10:00:00Z'), utc('2025-01-07T10:00:00Z')];
    const { ticks, format } = timeTicks(week, 8, 'UTC');
    // the middays inside 1 January 10:00 … 7 January 10:00: 1 … 6 January
    expect(ticks).toEqual(
      ['01', '02', '03', '04', '05', '06'].map((d) => utc(`2025-01-${d}T12:00:00Z`)),
    );
    expect(new Set(ticks.map(format)).size).toBe(ticks.length);
  });
  it('timeTicks — three days in Chicago — midday of the farm day (18:00 UTC in winter)', () => {
    // 1 Jan 00:00 UTC is 31 Dec 18:00 CST: 31 December's midday is before the start
    const days: [number, number] = [utc('2025-01-01T00:00:00Z'), utc('2025-01-04T00:00:00Z')];
    expect(timeTicks(days, 6, 'America/Chicago').ticks).toEqual([
      utc('2025-01-01T18:00:00Z'),
      utc('2025-01-02T18:00:00Z'),
      utc('2025-01-03T18:00:00Z'),
    ]);
  });
  it('timeTicks — 1 … 21 January (no two month starts), at most 3 — evenly spaced: days 0, 10, 20', () => {
    const span: [number, number] = [utc('2025-01-01T00:00:00Z'), utc('2025-01-21T00:00:00Z')];
    expect(timeTicks(span, 3, 'UTC').ticks).toEqual([
      utc('2025-01-01T00:00:00Z'),
      utc('2025-01-11T00:00:00Z'),
      utc('2025-01-21T00:00:00Z'),
    ]);
  });
});
