import { describe, expect, it } from 'vitest';
import {
  accumulatedRepairCost,
  REMAINING_VALUE_COEFFICIENTS,
  REMAINING_VALUE_PROVENANCE,
  remainingValueFraction,
  repairFactorKindForCategory,
  REPAIR_FACTORS,
  repairCostBetween,
  roundHalfUp,
} from '../../shared/domain/cost';

const tractor = REPAIR_FACTORS.tractor_2wd;

describe('cost — ASABE D497 repair and maintenance model', () => {
  it('cost — CHECKS.md §1 worked example (derived; inputs from ISU Ag Decision Maker A3-29) — $37,800 at 6,000 h', () => {
    // 150,000 × 0.007 × 6² = 37,800, i.e. $6.30/h.
    const total = accumulatedRepairCost(150_000, tractor.rf1, tractor.rf2, 6000);
    expect(total).toBeCloseTo(37_800, 6);
    expect(total / 6000).toBeCloseTo(6.3, 9);
  });

  it('cost — CHECKS.md §1 (derived) — yearly R&M at 400 h/yr: year 1 168, 2 504, 10 3,192, 15 4,872', () => {
    const year = (n: number) =>
      repairCostBetween(150_000, tractor.rf1, tractor.rf2, 400 * (n - 1), 400 * n);
    expect(year(1)).toBeCloseTo(168, 6);
    expect(year(2)).toBeCloseTo(504, 6);
    expect(year(10)).toBeCloseTo(3192, 6);
    expect(year(15)).toBeCloseTo(4872, 6);
  });

  it('cost — Iowa State University Extension PM 710, Table 3 — 2WD tractor 1,000…10,000 h: 1,3,6,11,18,25,34,45,57,70 %', () => {
    const percents = Array.from({ length: 10 }, (_, i) =>
      roundHalfUp(accumulatedRepairCost(100, tractor.rf1, tractor.rf2, 1000 * (i + 1))),
    );
    expect(percents).toEqual([1, 3, 6, 11, 18, 25, 34, 45, 57, 70]);
  });

  it('cost — PM 710, Table 3 — 4WD tractor 1,000…10,000 h, incl. the 5,000 h trap (7.5 → 8)', () => {
    const f = REPAIR_FACTORS.tractor_4wd;
    const percents = Array.from({ length: 10 }, (_, i) =>
      roundHalfUp(accumulatedRepairCost(100, f.rf1, f.rf2, 1000 * (i + 1))),
    );
    expect(percents).toEqual([0, 1, 3, 5, 8, 11, 15, 19, 24, 30]);
    expect(accumulatedRepairCost(100, f.rf1, f.rf2, 5000)).toBeCloseTo(7.5, 9);
  });

  it('cost — PM 710, Table 3 — plow, tandem disk and chisel plow rows agree to the rounding', () => {
    const row = (f: { rf1: number; rf2: number }, step: number, n: number) =>
      Array.from({ length: n }, (_, i) =>
        roundHalfUp(accumulatedRepairCost(100, f.rf1, f.rf2, step * (i + 1))),
      );
    expect(row(REPAIR_FACTORS.moldboard_plow, 200, 10)).toEqual([
      2, 6, 12, 19, 29, 40, 53, 68, 84, 101,
    ]);
    expect(row(REPAIR_FACTORS.tandem_disk, 200, 10)).toEqual([1, 4, 8, 12, 18, 25, 32, 40, 49, 58]);
    expect(row(REPAIR_FACTORS.chisel_plow, 200, 9)).toEqual([3, 8, 14, 20, 28, 36, 45, 54, 64]);
  });

  it('cost — roundHalfUp — halves go up, binary noise is cleared', () => {
    expect(roundHalfUp(7.5)).toBe(8);
    expect(roundHalfUp(7.499999999999999)).toBe(8);
    expect(roundHalfUp(7.49)).toBe(7);
    expect(roundHalfUp(1.005, 2)).toBe(1.01);
  });

  it('cost — no hours, no cost', () => {
    expect(accumulatedRepairCost(150_000, 0.007, 2, 0)).toBe(0);
  });

  it('cost — every repair-factor row names its provenance as CHECKS.md §1 gives it', () => {
    // Tractors: factors derived from PM 710 Table 3, life and total-life % from memory; plow,
    // disk, chisel: factors derived from the table, life from memory; the rest from memory.
    const table = 'derived from Iowa State University Extension PM 710, Table 3';
    const provenance = Object.fromEntries(
      Object.entries(REPAIR_FACTORS).map(([kind, f]) => [kind, f.provenance]),
    );
    expect(provenance).toEqual({
      tractor_2wd: `factors: ${table} (accumulated repair costs); life and total-life %: from memory`,
      tractor_4wd: `factors: ${table} (accumulated repair costs); life and total-life %: from memory`,
      moldboard_plow: `factors: ${table}; life: from memory`,
      tandem_disk: `factors: ${table}; life: from memory`,
      chisel_plow: `factors: ${table}; life: from memory`,
      combine_self_propelled:
        'ASABE D497 form; factors, life and total-life %: from memory, not verified',
      round_baler_large:
        'ASABE D497 form; factors, life and total-life %: from memory, not verified',
      mower_conditioner_rotary:
        'ASABE D497 form; factors, life and total-life %: from memory, not verified',
      row_crop_planter:
        'ASABE D497 form; factors, life and total-life %: from memory, not verified',
    });
  });
});

// The remaining-value coefficients C1–C3 are from memory (CHECKS.md §2: not verified against the
// ASABE document); the fractions below are derived from them, and one is checked against a
// published figure.
describe('cost — remaining value (ASABE D497 form; coefficients from memory, CHECKS.md §2)', () => {
  it('remaining value — 150 hp+, 15 years, 400 h/yr — 0.2276 (derived; ISU A3-29 prints 23 %, published)', () => {
    // (0.976 − 0.119 × √15 − 0.0019 × √400)² = (0.976 − 0.46089 − 0.038)² = 0.47711² = 0.2276.
    const c = REMAINING_VALUE_COEFFICIENTS.tractor_150hp_plus;
    expect(c).toEqual({ label: 'Tractor, 150 hp and over', c1: 0.976, c2: 0.119, c3: 0.0019 });
    const fraction = remainingValueFraction(c.c1, c.c2, c.c3, 15, 400);
    expect(fraction).toBeCloseTo(0.2276, 4);
    expect(roundHalfUp(fraction * 100)).toBe(23);
  });

  it('remaining value — 80–149 hp 15 y 400 h → 0.2902; under 80 hp 1 y 200 h → 0.6496 (derived from coefficients from memory)', () => {
    // (0.942 − 0.1 × √15 − 0.0008 × √400)² = (0.942 − 0.38730 − 0.016)² = 0.53870² = 0.2902;
    // (0.981 − 0.093 × √1 − 0.0058 × √200)² = (0.981 − 0.093 − 0.08202)² = 0.80598² = 0.6496.
    const mid = REMAINING_VALUE_COEFFICIENTS.tractor_80_149hp;
    const small = REMAINING_VALUE_COEFFICIENTS.tractor_under_80hp;
    expect([mid.c1, mid.c2, mid.c3]).toEqual([0.942, 0.1, 0.0008]);
    expect([small.c1, small.c2, small.c3]).toEqual([0.981, 0.093, 0.0058]);
    expect(remainingValueFraction(mid.c1, mid.c2, mid.c3, 15, 400)).toBeCloseTo(0.2902, 4);
    expect(remainingValueFraction(small.c1, small.c2, small.c3, 1, 200)).toBeCloseTo(0.6496, 4);
  });

  it('remaining value — past the curve’s zero (80 years) — 0, not rising again', () => {
    const c = REMAINING_VALUE_COEFFICIENTS.tractor_150hp_plus;
    expect(remainingValueFraction(c.c1, c.c2, c.c3, 80, 400)).toBe(0);
  });
});

describe('cost — edges', () => {
  it('cost — negative hours — no cost (not the square of a negative)', () => {
    expect(accumulatedRepairCost(150_000, 0.007, 2, -1000)).toBe(0);
  });

  it('cost — repair-factor kind by category — tractor, combine, baler, mower; none for a sprayer', () => {
    expect(repairFactorKindForCategory('tractor')).toBe('tractor_2wd');
    expect(repairFactorKindForCategory('combine')).toBe('combine_self_propelled');
    expect(repairFactorKindForCategory('baler')).toBe('round_baler_large');
    expect(repairFactorKindForCategory('mower')).toBe('mower_conditioner_rotary');
    expect(repairFactorKindForCategory('sprayer')).toBeNull();
  });

  it('cost — remaining-value provenance — coefficients from memory, checked against A3-29', () => {
    expect(REMAINING_VALUE_PROVENANCE).toBe(
      'ASABE D497 form; coefficients from memory, checked against Iowa State University Extension Ag Decision Maker A3-29 (150 hp+, 15 years, 400 h/yr prints 23 %)',
    );
  });
});
