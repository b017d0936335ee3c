// SAE J1939 engine hours (shared/domain/j1939.ts) and candump lines (shared/domain/candump.ts).
// Check values from ../shared/CHECKS.md §4 (after SAE J1939-71, SPN 247 in PGN 65253: bytes 1–4
// little-endian, 0.05 h/bit, raw above 0xFAFFFFFF = error / not available): 1,234.5 h ↔ raw
// 24,690 ↔ bytes 72 60 00 00. The identifier layout (priority, EDP/DP, PF, PS, SA; PDU2 when
// PF ≥ 240) is SAE J1939-21's, worked by hand here.
import { describe, expect, it } from 'vitest';
import {
  PGN_ENGINE_HOURS,
  engineHoursBytes,
  engineHoursOf,
  pgnOf,
  sourceAddressOf,
} from '../../shared/domain/j1939';
import { lastOfEachHour, parseCandumpLine } from '../../shared/domain/candump';

describe('J1939 SPN 247 — engine total hours (CHECKS.md §4, SAE J1939-71)', () => {
  it('bytes 72 60 00 00 — raw 24,690 — 1,234.5 h', () => {
    expect(engineHoursOf([0x72, 0x60, 0x00, 0x00, 0xff, 0xff, 0xff, 0xff])).toEqual({
      ok: true,
      raw: 24_690,
      hours: 1234.5,
    });
  });

  it('1,234.5 h — encodes to bytes 72 60 00 00 (little-endian, 0.05 h/bit)', () => {
    expect(engineHoursBytes(1234.5)).toEqual([0x72, 0x60, 0x00, 0x00]);
  });

  it('the largest valid raw 0xFAFFFFFF — 210,554,060.75 h (0xFAFFFFFF × 0.05, by hand)', () => {
    const out = engineHoursOf([0xff, 0xff, 0xff, 0xfa]);
    expect(out).toEqual({ ok: true, raw: 0xfaffffff, hours: 210_554_060.75 });
  });

  it.each([
    ['0xFB000000 (first value past the valid range)', [0x00, 0x00, 0x00, 0xfb]],
    ['0xFE000000 (error indicator range)', [0x00, 0x00, 0x00, 0xfe]],
    ['0xFFFFFFFF (not available)', [0xff, 0xff, 0xff, 0xff]],
  ])('raw %s — refused as error or not available', (_name, bytes) => {
    const out = engineHoursOf(bytes);
    expect(out.ok).toBe(false);
    expect(out.ok ? '' : out.reason).toMatch(/not available or in error/);
  });

  it('a frame with fewer than 4 data bytes — refused (SPN 247 needs bytes 1–4)', () => {
    expect(engineHoursOf([0x72, 0x60]).ok).toBe(false);
  });
});

describe('J1939 PGN of a 29-bit identifier (SAE J1939-21 layout, by hand)', () => {
  it('0x18FEE500 — priority 6, PF 0xFE ≥ 240 so PGN 0xFEE5 = 65,253, source address 0x00', () => {
    expect(pgnOf(0x18fee500)).toBe(65_253);
    expect(pgnOf(0x18fee500)).toBe(PGN_ENGINE_HOURS);
    expect(sourceAddressOf(0x18fee500)).toBe(0x00);
  });

  it('0x0CFEE517 — another priority (3) and source address (0x17), same PGN 65,253', () => {
    expect(pgnOf(0x0cfee517)).toBe(0xfee5);
    expect(sourceAddressOf(0x0cfee517)).toBe(0x17);
  });

  it('0x18FEEE00 — PGN 65,262 (0xFEEE, engine temperature): not engine hours', () => {
    expect(pgnOf(0x18feee00)).toBe(0xfeee);
  });

  it('0x0CF00400 — PF 0xF0 = 240 is PDU2: PGN 61,444 (0xF004, EEC1), PS kept', () => {
    expect(pgnOf(0x0cf00400)).toBe(0xf004);
  });

  it('0x18EAFF00 — PF 0xEA < 240 is PDU1: PS (0xFF, destination) counts 0, PGN 59,904 (0xEA00)', () => {
    expect(pgnOf(0x18eaff00)).toBe(0xea00);
  });

  it('0x19FEE500 — data page 1: PGN 0x1FEE5 (131,045), not 65,253', () => {
    expect(pgnOf(0x19fee500)).toBe(0x1fee5);
  });
});

describe('candump lines', () => {
  it('candump -l form — time, interface, 29-bit id and 8 bytes', () => {
    expect(parseCandumpLine('(1764662400.250000) can0 18FEE500#7260000000000000')).toEqual({
      timeMs: 1_764_662_400_250,
      iface: 'can0',
      canId: 0x18fee500,
      extended: true,
      data: [0x72, 0x60, 0, 0, 0, 0, 0, 0],
    });
  });

  it('screen form without a time — bytes spaced, [8] matches the count', () => {
    expect(parseCandumpLine('  can0  18FEE500   [8]  72 60 00 00 FF FF FF FF')).toMatchObject({
      timeMs: null,
      canId: 0x18fee500,
      data: [0x72, 0x60, 0, 0, 0xff, 0xff, 0xff, 0xff],
    });
  });

  it('screen form with a time (candump -ta)', () => {
    expect(
      parseCandumpLine(' (1764662400.000001)  vcan1  18FEE500   [8]  72 60 00 00 00 00 00 00'),
    ).toMatchObject({ timeMs: 1_764_662_400_000, iface: 'vcan1' });
  });

  it('an 11-bit id — read, marked not extended', () => {
    expect(parseCandumpLine('(1.0) can0 123#0102')).toMatchObject({
      extended: false,
      canId: 0x123,
    });
  });

  it.each([
    'hello',
    'can0 18FEE500#726',
    'can0  18FEE500   [8]  72 60 00',
    '(abc) can0 18FEE500#7260000000000000',
    'can0 18FEE5#7260',
  ])('%j — not a candump line (null)', (line) => {
    expect(parseCandumpLine(line)).toBeNull();
  });

  it('last of each clock hour — 10:05, 10:55, 11:10 keeps 10:55 and 11:10, in time order', () => {
    const at = (h: number, m: number) => Date.UTC(2026, 0, 1, h, m);
    const kept = lastOfEachHour([
      { timeMs: at(11, 10), n: 3 },
      { timeMs: at(10, 5), n: 1 },
      { timeMs: at(10, 55), n: 2 },
    ]);
    expect(kept.map((k) => k.n)).toEqual([2, 3]);
  });
});
