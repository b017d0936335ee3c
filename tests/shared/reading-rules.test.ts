import { describe, expect, it } from 'vitest';
import { checkReading, DEFAULT_MAX_PER_DAY } from '../../shared/domain/reading-rules';

const at = (iso: string) => Date.parse(`${iso}Z`);
const hour = 3_600_000;
const previous = { value: 1052, takenAtMs: at('2024-03-11T08:00') };
const next = { value: 1090, takenAtMs: at('2024-03-14T08:00') };
const opts = { nowMs: at('2024-03-15T12:00'), meterUnit: 'h' };

describe('reading rules', () => {
  it('reading rules — a plausible reading between its neighbours — accepted', () => {
    const candidate = { value: 1070, takenAtMs: at('2024-03-12T18:00') };
    expect(checkReading(candidate, { previous, next }, opts)).toBeNull();
  });

  it('reading rules — lower than the previous — backwards, names the previous reading', () => {
    const result = checkReading(
      { value: 1040, takenAtMs: at('2024-03-12T08:00') },
      { previous },
      {
        ...opts,
        formatTime: (ms) => new Date(ms).toISOString().slice(0, 16).replace('T', ' '),
      },
    );
    expect(result).toEqual({
      field: 'value',
      rule: 'backwards',
      message:
        'Reading 1,040 h is lower than the previous reading of 1,052 h taken 2024-03-11 08:00 — readings may not go backwards. If a new meter was fitted, record it with “Record meter replacement” on its meter.',
    });
  });

  it('reading rules — higher than the next — above_next, names the next reading', () => {
    const result = checkReading(
      { value: 1095, takenAtMs: at('2024-03-12T08:00') },
      { previous, next },
      opts,
    );
    expect(result?.rule).toBe('above_next');
    expect(result?.field).toBe('value');
    expect(result?.message).toContain('the next reading of 1,090 h taken 2024-03-14 08:00 UTC');
  });

  it('reading rules — dated 6 minutes ahead of now — future; 4 minutes — accepted (5 min skew)', () => {
    const ahead = (minutes: number) => ({ value: 1100, takenAtMs: opts.nowMs + minutes * 60_000 });
    const result = checkReading(ahead(6), { previous }, opts);
    expect(result?.rule).toBe('future');
    expect(result?.field).toBe('takenAt');
    expect(result?.message).toContain('in the future');
    expect(result?.message).toContain('the previous reading of 1,052 h');
    expect(checkReading(ahead(4), { previous }, opts)).toBeNull();
  });

  it('reading rules — 30 h in 24 h — too_fast, names the previous reading and the 24 h/day limit', () => {
    const result = checkReading(
      { value: 1082, takenAtMs: previous.takenAtMs + 24 * hour },
      { previous },
      opts,
    );
    expect(result?.rule).toBe('too_fast');
    expect(result?.message).toBe(
      'Reading 1,082 h implies 30 h per day since the previous reading of 1,052 h taken 2024-03-11 08:00 UTC — more than the 24 h per day this meter can advance.',
    );
  });

  it('reading rules — exactly 24 h in 24 h — accepted; 24 h in 23.5 h — too_fast', () => {
    const candidate = (elapsedHours: number) => ({
      value: 1076,
      takenAtMs: previous.takenAtMs + elapsedHours * hour,
    });
    expect(checkReading(candidate(24), { previous }, opts)).toBeNull();
    expect(checkReading(candidate(23.5), { previous }, opts)?.rule).toBe('too_fast');
  });

  it('reading rules — too far below the next for the time between — too_fast against the next', () => {
    const result = checkReading(
      { value: 1053, takenAtMs: at('2024-03-13T20:00') },
      { previous, next },
      opts,
    );
    expect(result?.rule).toBe('too_fast');
    expect(result?.message).toContain(
      'until the next reading of 1,090 h taken 2024-03-14 08:00 UTC',
    );
  });

  it('reading rules — same instant as the previous with a higher value — too_fast', () => {
    const result = checkReading(
      { value: 1060, takenAtMs: previous.takenAtMs },
      { previous },
      {
        ...opts,
        skewMs: 0,
      },
    );
    expect(result?.rule).toBe('too_fast');
    expect(result?.message).toContain('with no time elapsed');
  });

  // Daily maxima: 24 h a day for an hour meter is a hard limit (a day has 24 hours); 1,500 km,
  // 2,000 bales, 300 ha and 750 acres a day are common practice (generous ceilings for one
  // machine in one day, no published source); 930 mi is the km ceiling in miles (1,500 ÷
  // 1.609344 = 932.06, NIST Handbook 44's mile, rounded down) — tests/shared/miles-meter.test.ts.
  it('reading rules — km meter uses its own default maximum (1,500 km/day, common practice)', () => {
    const prev = { value: 200_000, takenAtMs: at('2024-03-11T08:00') };
    const day = prev.takenAtMs + 24 * hour;
    const km = { ...opts, meterUnit: 'km' };
    expect(checkReading({ value: 201_400, takenAtMs: day }, { previous: prev }, km)).toBeNull();
    const refused = checkReading({ value: 201_600, takenAtMs: day }, { previous: prev }, km);
    expect(refused?.rule).toBe('too_fast');
    expect(refused?.message).toContain('the previous reading of 200,000 km');
    expect(DEFAULT_MAX_PER_DAY).toEqual({
      h: 24,
      km: 1500,
      mi: 930,
      bales: 2000,
      ha: 300,
      acres: 750,
    });
  });
});

describe('reading rules — boundaries', () => {
  it('reading rules — equal to the previous, equal to the next — accepted (not backwards, not above)', () => {
    const sameAsPrevious = { value: 1052, takenAtMs: at('2024-03-12T08:00') };
    expect(checkReading(sameAsPrevious, { previous, next }, opts)).toBeNull();
    const sameAsNext = { value: 1090, takenAtMs: at('2024-03-13T20:00') };
    expect(checkReading(sameAsNext, { previous, next }, opts)).toBeNull();
  });

  it('reading rules — dated exactly now + 5 minutes — accepted', () => {
    const edge = { value: 1100, takenAtMs: opts.nowMs + 5 * 60_000 };
    expect(checkReading(edge, { previous }, opts)).toBeNull();
  });

  it('reading rules — no skew, exactly 24 h in 24 h — accepted (the limit itself is allowed)', () => {
    const candidate = { value: 1076, takenAtMs: previous.takenAtMs + 24 * hour };
    expect(checkReading(candidate, { previous }, { ...opts, skewMs: 0 })).toBeNull();
  });

  it('reading rules — 25 h in 23 h — too_fast on the value, pace to one decimal (26.1 h per day)', () => {
    // 25 × 24 / 23 = 26.087 h per day, shown as 26.1.
    const result = checkReading(
      { value: 1077, takenAtMs: previous.takenAtMs + 23 * hour },
      { previous },
      opts,
    );
    expect(result?.field).toBe('value');
    expect(result?.message).toContain('implies 26.1 h per day since');
  });

  it('reading rules — too fast against the next — the field is the value', () => {
    const result = checkReading(
      { value: 1053, takenAtMs: at('2024-03-13T20:00') },
      { previous, next },
      opts,
    );
    expect(result?.field).toBe('value');
  });

  it('reading rules — a first reading dated in the future — future, no previous reading named', () => {
    const result = checkReading({ value: 10, takenAtMs: opts.nowMs + 6 * 60_000 }, {}, opts);
    expect(result?.message).toBe(
      'Reading time 2024-03-15 12:06 UTC is in the future (now 2024-03-15 12:00 UTC) — readings may not be dated ahead of now.',
    );
  });
});
