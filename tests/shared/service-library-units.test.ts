// A class of the service library applied in another meter unit (shared/domain/service-library/
// meter-variants.ts): the grain truck's km figures on a miles odometer, the balers' hours on a
// bale counter. Sources: 1 mi = 1.609344 km (NIST Handbook 44, Appendix C, exact); the baling
// paces — 30 round bales an hour, 40 large square bales an hour — are common practice (no
// published source), chosen at the slow end so a bale interval errs short. Rounding rule (the
// module's, worked by hand here): down to two significant figures, whole units below 100.
import { describe, expect, it } from 'vitest';
import {
  classMeterUnits,
  roundDownMeterFigure,
  serviceLibraryClass,
} from '../../shared/domain/service-library';

const task = (c: ReturnType<typeof serviceLibraryClass>, name: string) => {
  const t = c.tasks.find((x) => x.name === name);
  if (!t) throw new Error(`no task "${name}" in ${c.machineClass}`);
  return t;
};
const figures = (t: { intervalMeter: number | null; warnMeter: number | null }) => [
  t.intervalMeter,
  t.warnMeter,
];

describe('service library — meter variants', () => {
  it('rounding down to two significant figures: 12,427.42 → 12,000; 6,213.71 → 6,200; 1,500 → 1,500; 62.14 → 62; 0.62 → 1', () => {
    expect(roundDownMeterFigure(12427.42)).toBe(12000);
    expect(roundDownMeterFigure(6213.71)).toBe(6200);
    expect(roundDownMeterFigure(50 * 30)).toBe(1500); // exact products stay exact
    expect(roundDownMeterFigure(621.37)).toBe(620);
    expect(roundDownMeterFigure(62.14)).toBe(62);
    expect(roundDownMeterFigure(0.62)).toBe(1);
  });

  it('the truck counts in km or miles, the balers in hours or bales, the rest in hours only', () => {
    expect(classMeterUnits('grain_truck')).toEqual(['km', 'mi']);
    expect(classMeterUnits('round_baler')).toEqual(['h', 'bales']);
    expect(classMeterUnits('square_baler')).toEqual(['h', 'bales']);
    expect(classMeterUnits('combine')).toEqual(['h']);
  });

  // Grain truck, km → mi (÷ 1.609344), warning windows a tenth of the km interval:
  //   engine oil   20,000 km → 12,427.42 mi → 12,000 mi; warn 2,000 km → 1,242.74 → 1,200 mi
  //   brakes       10,000 km →  6,213.71 mi →  6,200 mi; warn 1,000 km →   621.37 →   620 mi
  //   transmission 100,000 km → 62,137.12 mi → 62,000 mi
  //   wheel nuts   first at 100 km → 62.14 mi → 62 mi; then every 10,000 km → 6,200 mi
  it('grain truck on a miles odometer — 20,000 km → 12,000 mi, 10,000 km → 6,200 mi, first at 100 km → 62 mi; days untouched', () => {
    const km = serviceLibraryClass('grain_truck');
    const mi = serviceLibraryClass('grain_truck', 'mi');
    expect(mi.meterUnit).toBe('mi');
    expect(mi.conversion).toMatch(/1 mi = 1\.609344 km, NIST Handbook 44/);
    expect(figures(task(km, 'Engine oil and filter'))).toEqual([20000, 2000]);
    expect(figures(task(mi, 'Engine oil and filter'))).toEqual([12000, 1200]);
    expect(figures(task(km, 'Brakes and air system'))).toEqual([10000, 1000]);
    expect(figures(task(mi, 'Brakes and air system'))).toEqual([6200, 620]);
    expect(task(mi, 'Brakes and air system').intervalDays).toBe(180);
    expect(task(km, 'Transmission and axle oil').intervalMeter).toBe(100000);
    expect(task(mi, 'Transmission and axle oil').intervalMeter).toBe(62000);
    const nuts = task(mi, 'Wheel nut torque');
    expect([task(km, 'Wheel nut torque').firstServiceMeter, nuts.firstServiceMeter]).toEqual([
      100, 62,
    ]);
    expect(nuts.intervalMeter).toBe(6200);
    expect(nuts.instructions).toMatch(/Meter figures in miles/);
    // a calendar-only task is left as it is, without the note
    const yearly = task(mi, 'Annual roadworthiness test');
    expect(yearly).toEqual(task(km, 'Annual roadworthiness test'));
  });

  it('every meter figure of the miles truck is at most its km figure ÷ 1.609344 and at least 90% of it', () => {
    const km = serviceLibraryClass('grain_truck').tasks;
    const mi = serviceLibraryClass('grain_truck', 'mi').tasks;
    let checked = 0;
    km.forEach((t, i) => {
      for (const field of ['intervalMeter', 'firstServiceMeter', 'warnMeter'] as const) {
        const from = t[field];
        if (from === null || from < 1000) continue;
        const exact = from / 1.609344;
        expect(mi[i][field]!).toBeLessThanOrEqual(exact);
        expect(mi[i][field]!).toBeGreaterThanOrEqual(exact * 0.9);
        checked += 1;
      }
    });
    expect(checked).toBeGreaterThan(8);
  });

  // Round baler, hours → bales at 30 bales an hour:
  //   PTO shaft crosses   8 h →   240 bales; warn 1 h → 30 bales
  //   pickup tines       50 h → 1,500 bales; warn 5 h → 150 bales
  //   main gearbox oil  500 h → 15,000 bales, first at 50 h → 1,500 bales; 365 days untouched
  it('round baler on a bale counter — 8 h → 240 bales, 50 h → 1,500 bales, 500 h → 15,000 bales (30 bales/h, common practice)', () => {
    const h = serviceLibraryClass('round_baler');
    const bales = serviceLibraryClass('round_baler', 'bales');
    expect(bales.meterUnit).toBe('bales');
    expect(bales.conversion).toMatch(/30 bales an hour.*common practice/);
    expect(figures(task(h, 'PTO shaft crosses and sliding tubes'))).toEqual([8, 1]);
    expect(figures(task(bales, 'PTO shaft crosses and sliding tubes'))).toEqual([240, 30]);
    expect(figures(task(h, 'Pickup tines and guards'))).toEqual([50, 5]);
    expect(figures(task(bales, 'Pickup tines and guards'))).toEqual([1500, 150]);
    const gearbox = task(bales, 'Main gearbox oil');
    expect([gearbox.intervalMeter, gearbox.firstServiceMeter, gearbox.intervalDays]).toEqual([
      15000, 1500, 365,
    ]);
    expect(task(bales, 'Pickup tines and guards').parts).toEqual(
      task(h, 'Pickup tines and guards').parts,
    );
  });

  it('square baler on a bale counter — 50 h → 2,000 bales at 40 bales/h, and says a small square baler bales faster', () => {
    const bales = serviceLibraryClass('square_baler', 'bales');
    expect(task(bales, 'Pickup tines and guards').intervalMeter).toBe(2000);
    expect(bales.conversion).toMatch(/small square baler/);
  });

  it('a unit the class has no variant in — the class is returned in its own unit, unconverted', () => {
    const asked = serviceLibraryClass('combine', 'mi');
    expect(asked.meterUnit).toBe('h');
    expect(asked.conversion).toBeNull();
    expect(asked.tasks).toEqual(serviceLibraryClass('combine').tasks);
  });
});
