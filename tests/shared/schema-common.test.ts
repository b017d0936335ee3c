// The building blocks of every request schema (shared/schemas/common.ts): text without control
// characters, numbers within named bounds, dates that exist and lie in their window.
import { describe, expect, it } from 'vitest';
import type { ZodType } from 'zod';
import {
  boundedNumber,
  CALENDAR_DATES,
  isoDate,
  isoDateTime,
  PAST_DATES,
  plainText,
  PLAN_DATES,
  shiftIsoDate,
} from '../../shared/schemas/common';

const today = new Date().toISOString().slice(0, 10);
const refusal = (schema: ZodType, value: unknown) => {
  const result = schema.safeParse(value);
  return result.success ? null : result.error.issues[0].message;
};

describe('plainText', () => {
  const line = plainText(20, { required: 'Enter a fleet number' });
  const notes = plainText(50, { multiline: true });

  it.each([
    ['NUL', 'T-\u000007'],
    ['a tab', 'T-\t07'],
    ['a line feed', 'T-07\nX'],
    ['ESC', '\u001b[31mT-07'],
    ['DEL', 'T-07\u007f'],
    ['a C1 control', 'T-07\u0085'],
  ])('one line — %s is refused, naming the rule', (_what, value) => {
    expect(refusal(line, value)).toBe(
      'Remove control characters: line breaks, tabs and the like are not allowed here',
    );
  });

  it('one line — trimmed; empty is refused with the field’s own message; 21 characters too many', () => {
    expect(line.parse('  T-07 ')).toBe('T-07');
    expect(refusal(line, '   ')).toBe('Enter a fleet number');
    expect(refusal(line, 'x'.repeat(21))).toBe('Use at most 20 characters');
    expect(refusal(line, 7)).toBe('Enter a fleet number');
  });

  it('multi-line — keeps line feeds and tabs, turns CR LF into LF, refuses NUL', () => {
    expect(notes.parse('Drain warm.\r\n\tThen refill.')).toBe('Drain warm.\n\tThen refill.');
    expect(refusal(notes, 'oil\u0000')).toBe(
      'Remove control characters: only line breaks and tabs are allowed',
    );
  });

  it('any text — a lone surrogate is refused (it could not be stored as it was sent)', () => {
    expect(refusal(notes, 'x\ud800')).toBe('Text must be valid Unicode');
    expect(notes.parse('🚜 ok')).toBe('🚜 ok');
  });
});

describe('boundedNumber', () => {
  const labour = boundedNumber('Estimated labour', { min: 0, max: 1000, exclusiveMin: true });
  const days = boundedNumber('Day interval', { min: 0, max: 7300, exclusiveMin: true, int: true });

  it('labour — 10,001 h and 1e308 are refused naming the bound; 1,000 h is stored', () => {
    expect(refusal(labour, 10_001)).toBe('Estimated labour must be at most 1,000');
    expect(refusal(labour, 1e308)).toBe('Estimated labour must be at most 1,000');
    expect(refusal(labour, 0)).toBe('Estimated labour must be greater than 0');
    expect(labour.parse(1000)).toBe(1000);
  });

  it('day interval — 2^31 and 1.5 days are refused; text is not a number', () => {
    expect(refusal(days, 2 ** 31)).toBe('Day interval must be at most 7,300');
    expect(refusal(days, 1.5)).toBe('Day interval must be a whole number');
    expect(refusal(days, '30')).toBe('Day interval must be a number');
  });
});

describe('isoDate and isoDateTime', () => {
  const performedOn = isoDate('Performed on', PAST_DATES);
  const plannedFor = isoDate('Planned for', PLAN_DATES);

  it('a date that does not exist — 2026-02-30 and 2025-02-29 are refused; 2024-02-29 exists', () => {
    const week = isoDate('Start', CALENDAR_DATES);
    expect(refusal(week, '2026-02-30')).toBe('Start must be a real date, yyyy-mm-dd');
    expect(refusal(week, '2025-02-29')).toBe('Start must be a real date, yyyy-mm-dd');
    expect(week.parse('2024-02-29')).toBe('2024-02-29');
  });

  it('past dates — the year 0000, 1949 and next week are refused; today is fine', () => {
    const rule = 'Performed on may not be before 1950-01-01 nor in the future';
    expect(refusal(performedOn, '0000-01-01')).toBe(rule);
    expect(refusal(performedOn, '1949-12-31')).toBe(rule);
    expect(refusal(performedOn, shiftIsoDate(today, { days: 7 }))).toBe(rule);
    expect(performedOn.parse(today)).toBe(today);
  });

  it('plans — within two years back and five years ahead of today', () => {
    const from = shiftIsoDate(today, { years: -2 });
    const to = shiftIsoDate(today, { years: 5 });
    const rule = `Planned for must be between ${from} and ${to}`;
    expect(refusal(plannedFor, shiftIsoDate(to, { days: 1 }))).toBe(rule);
    expect(refusal(plannedFor, shiftIsoDate(from, { days: -1 }))).toBe(rule);
    expect(plannedFor.parse(to)).toBe(to);
  });

  it('date-times — need their offset; the year 0000 and the year 2999 are refused', () => {
    const takenAt = isoDateTime('Time taken', PAST_DATES);
    const rule = 'Time taken may not be before 1950-01-01 nor in the future';
    expect(refusal(takenAt, '0000-01-01T00:00:00Z')).toBe(rule);
    expect(refusal(takenAt, '2999-01-01T00:00:00Z')).toBe(rule);
    expect(refusal(takenAt, '2026-01-01T08:00:00')).toMatch(/^Time taken must be an ISO date-time/);
    expect(takenAt.parse('2026-01-01T08:00:00-06:00')).toBe('2026-01-01T08:00:00-06:00');
  });
});
