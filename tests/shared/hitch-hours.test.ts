import { describe, expect, it } from 'vitest';
import {
  hitchHoursAt,
  hitchReadingPoints,
  meterValueAt,
  spanHoursUntil,
  type HitchSpanHours,
} from '../../shared/domain/hitch-hours';
import { toLifetimeValue } from '../../shared/domain/lifetime';

// Hand-worked examples (no published table exists for this; the arithmetic is written out beside
// each check). Linear interpolation between two readings is the usual way to read a meter between
// them (common practice). One day, UTC, on tractor T:
//   06:00 1,000 h · 10:00 1,008 h · 14:00 1,012 h · 18:00 1,020 h
// so T runs 2 h per clock hour 06–10, 1 h per hour 10–14 and 2 h per hour 14–18.
const at = (hhmm: string, day = '2026-06-01') => Date.parse(`${day}T${hhmm}:00Z`);
const tractor = [
  { takenAtMs: at('06:00'), lifetime: 1000 },
  { takenAtMs: at('10:00'), lifetime: 1008 },
  { takenAtMs: at('14:00'), lifetime: 1012 },
  { takenAtMs: at('18:00'), lifetime: 1020 },
];
// A mower on T 08:00–16:00 and, overlapping it, a rake on T's front from 12:00, still hitched.
const mower: HitchSpanHours = { startMs: at('08:00'), endMs: at('16:00'), readings: tractor };
const rake: HitchSpanHours = { startMs: at('12:00'), endMs: null, readings: tractor };
const now = at('20:00');

describe('hitch hours — the tractor meter between readings', () => {
  it('meter value — 08:00 between 06:00 (1,000) and 10:00 (1,008) — 1,000 + 2/4 × 8 = 1,004', () => {
    expect(meterValueAt(tractor, at('08:00'))).toBe(1004);
  });

  it('meter value — on a reading — that reading; before the first — the first; after the last — the last', () => {
    expect(meterValueAt(tractor, at('14:00'))).toBe(1012);
    expect(meterValueAt(tractor, at('05:00'))).toBe(1000);
    expect(meterValueAt(tractor, at('19:30'))).toBe(1020);
    expect(meterValueAt([], at('12:00'))).toBeNull();
  });

  it('meter value — readings in any order — the same', () => {
    expect(meterValueAt([...tractor].reverse(), at('16:00'))).toBe(1016);
  });
});

describe('hitch hours — overlapping spans of one tractor with two implements', () => {
  it('mower 08:00–16:00 — v(16:00) = 1,012 + 2/4 × 8 = 1,016, v(08:00) = 1,004 — 12 h', () => {
    expect(spanHoursUntil(mower, now)).toBe(12);
  });

  it('rake from 12:00, open — v(12:00) = 1,008 + 2/4 × 4 = 1,010, runs to the last reading (18:00, 1,020) — 10 h', () => {
    expect(spanHoursUntil(rake, now)).toBe(10);
  });

  it('both pulled 12:00–16:00 — each counts the whole rise there (1,010 → 1,016 = 6 h), not a share', () => {
    const mowerBy12 = spanHoursUntil(mower, at('12:00')); // 1,010 − 1,004 = 6
    const rakeBy16 = spanHoursUntil(rake, at('16:00')); // 1,016 − 1,010 = 6
    expect(mowerBy12).toBe(6);
    expect(rakeBy16).toBe(6);
    expect(spanHoursUntil(mower, now) - mowerBy12).toBe(rakeBy16);
  });
});

describe('hitch hours — a span with no readings inside', () => {
  it('10:30–11:30, between 10:00 (1,008) and 14:00 (1,012) at 1 h/h — 1,009.5 − 1,008.5 = 1 h', () => {
    const span = { startMs: at('10:30'), endMs: at('11:30'), readings: tractor };
    expect(spanHoursUntil(span, now)).toBe(1);
  });

  it('a span before the tractor has any reading — 0 h (nothing known to have run)', () => {
    expect(
      spanHoursUntil({ startMs: at('02:00'), endMs: at('05:00'), readings: tractor }, now),
    ).toBe(0);
    expect(spanHoursUntil({ startMs: at('02:00'), endMs: null, readings: [] }, now)).toBe(0);
  });

  it('a span edge between readings and the other beyond the last — 09:00–22:00: 1,020 − 1,006 = 14 h', () => {
    // v(09:00) = 1,000 + 3/4 × 8 = 1,006; 22:00 is after 18:00, so 1,020 holds
    expect(
      spanHoursUntil({ startMs: at('09:00'), endMs: at('22:00'), readings: tractor }, at('23:00')),
    ).toBe(14);
  });
});

describe('hitch hours — across a tractor meter replacement', () => {
  it('old meter at 1,990 h (08:00) swapped at 09:00 (final 2,000, new from 0), new meter 6 h at 12:00 — 16 h, not 6 − 1,990', () => {
    const swap = [{ replacedAtMs: at('09:00'), oldFinalValue: 2000, newStartValue: 0 }];
    // lifetime of the new meter's 6 h: 6 + (2,000 − 0) = 2,006
    const readings = [
      { takenAtMs: at('08:00'), lifetime: toLifetimeValue(1990, at('08:00'), swap) },
      { takenAtMs: at('12:00'), lifetime: toLifetimeValue(6, at('12:00'), swap) },
    ];
    expect(readings[1].lifetime).toBe(2006);
    expect(spanHoursUntil({ startMs: at('08:00'), endMs: at('12:00'), readings }, now)).toBe(16);
  });
});

describe('hitch hours — the implement over several spans and its readings', () => {
  // The mower's second day on another tractor U: 08:00 500 h, 12:00 504 h (1 h/h); hitched 09–11.
  const tractorU = [
    { takenAtMs: at('08:00', '2026-06-02'), lifetime: 500 },
    { takenAtMs: at('12:00', '2026-06-02'), lifetime: 504 },
  ];
  const dayTwo = {
    startMs: at('09:00', '2026-06-02'),
    endMs: at('11:00', '2026-06-02'),
    readings: tractorU,
  };
  const spans = [mower, dayTwo];
  const later = at('12:00', '2026-06-02');

  it('hours at day two 10:00 — 12 h (day one) + (501 − 500) = 13 h; at the end — 12 + 2 = 14 h', () => {
    expect(hitchHoursAt(spans, at('10:00', '2026-06-02'))).toBe(13);
    expect(hitchHoursAt(spans, later)).toBe(14);
  });

  it('readings — base 1,210 h + hours at each tractor reading inside a span and at each end', () => {
    // day one: 10:00 → 1,008 − 1,004 = 4; 14:00 → 8; end 16:00 → 12. Day two: no U reading
    // inside 09–11, its end 11:00 → 12 + 2 = 14.
    expect(hitchReadingPoints(spans, 1210, later)).toEqual([
      { takenAtMs: at('10:00'), value: 1214 },
      { takenAtMs: at('14:00'), value: 1218 },
      { takenAtMs: at('16:00'), value: 1222 },
      { takenAtMs: at('11:00', '2026-06-02'), value: 1224 },
    ]);
  });

  it('readings of an open span — one at each tractor reading since it began, none at an end it has not reached', () => {
    // rake from 12:00: 14:00 → 1,012 − 1,010 = 2; 18:00 → 10
    expect(hitchReadingPoints([rake], 0, now)).toEqual([
      { takenAtMs: at('14:00'), value: 2 },
      { takenAtMs: at('18:00'), value: 10 },
    ]);
  });

  it('a tractor reading exactly at a span end — one reading at that instant', () => {
    const to14 = { startMs: at('08:00'), endMs: at('14:00'), readings: tractor };
    expect(hitchReadingPoints([to14], 0, now)).toEqual([
      { takenAtMs: at('10:00'), value: 4 },
      { takenAtMs: at('14:00'), value: 8 },
    ]);
  });
});
