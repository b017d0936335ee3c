// A class of the library in another meter unit than its figures are written in: the grain truck
// (written in km) on a US odometer in miles, the balers (written in hours) on a bale counter.
// Each meter figure of a task (interval, first service point, warning window) is converted and
// rounded down to two significant figures, so a converted interval is never longer than the
// class's own and at most about a tenth shorter. Day intervals are not touched. Every converted
// task says so under its instructions, with the factor used.
import type { MeterUnit } from '../../constants';
import type { TaskInput } from '../../schemas/schedule';
import { KILOMETRES_PER_MILE } from '../stock-units';
import { MACHINE_CLASS_METER_UNIT, type MachineClass } from './classes';

interface Variant {
  unit: MeterUnit;
  /** units of the variant per one unit of the class's own (miles per km, bales per hour) */
  rate: number;
  /** what every converted task and the class's description say about the figures */
  note: string;
}

const MILES: Variant = {
  unit: 'mi',
  rate: 1 / KILOMETRES_PER_MILE,
  note: "Meter figures in miles: the class's kilometres converted (1 mi = 1.609344 km, NIST Handbook 44) and rounded down to two significant figures; distances written in the instructions stay in km.",
};

/** A bale-counter variant at a baling pace that is common practice, not a manufacturer's figure. */
const bales = (perHour: number, pace: string): Variant => ({
  unit: 'bales',
  rate: perHour,
  note: `Meter figures in bales: the class's hours at about ${perHour} bales an hour (${pace}; common practice, not a manufacturer's figure), rounded down to two significant figures; hours written in the instructions stay the class's own. Where this baler's pace differs, change the figures to match it.`,
});

// The slower end of each baler's pace, so a bale interval errs short rather than long.
const VARIANTS: Partial<Record<MachineClass, Variant[]>> = {
  grain_truck: [MILES],
  round_baler: [bales(30, 'a bale about every two minutes, wrapping and ejecting included')],
  square_baler: [
    bales(
      40,
      'a large square baler; a small square baler makes several times as many bales an hour, so lengthen the figures for one',
    ),
  ],
};

/** The meter units a class can be applied in: the one its figures are written in, then variants. */
export function classMeterUnits(machineClass: MachineClass): MeterUnit[] {
  return [
    MACHINE_CLASS_METER_UNIT[machineClass],
    ...(VARIANTS[machineClass] ?? []).map((v) => v.unit),
  ];
}

/**
 * A converted meter figure, rounded down to two significant figures (12,427.4 → 12,000;
 * 6,213.7 → 6,200; 62.1 → 62), and below 100 to whole units, at least 1.
 */
export function roundDownMeterFigure(value: number): number {
  // the small allowance keeps an exact product (50 h × 30 = 1,500) from falling to 1,400
  if (value < 100) return Math.max(1, Math.floor(value + 1e-9));
  const step = 10 ** (Math.floor(Math.log10(value)) - 1);
  return Math.floor(value / step + 1e-9) * step;
}

/** The class's variant in `unit`, or null when `unit` is the class's own or not one of its own. */
export function classVariant(
  machineClass: MachineClass,
  unit: MeterUnit,
): { unit: MeterUnit; note: string } | null {
  const v = (VARIANTS[machineClass] ?? []).find((x) => x.unit === unit);
  return v ? { unit: v.unit, note: v.note } : null;
}

/**
 * The class's tasks with their meter figures in `unit` (intervals, first service points and
 * warning windows; days untouched), each saying how it was converted. Unchanged when `unit` is
 * the class's own or not one of its variants.
 */
export function tasksInMeterUnit(
  machineClass: MachineClass,
  tasks: TaskInput[],
  unit: MeterUnit,
): TaskInput[] {
  const v = (VARIANTS[machineClass] ?? []).find((x) => x.unit === unit);
  if (!v) return tasks;
  const convert = (figure: number | null) =>
    figure === null ? null : roundDownMeterFigure(figure * v.rate);
  return tasks.map((t) =>
    t.intervalMeter === null && t.firstServiceMeter === null && t.warnMeter === null
      ? t
      : {
          ...t,
          intervalMeter: convert(t.intervalMeter),
          firstServiceMeter: convert(t.firstServiceMeter),
          warnMeter: convert(t.warnMeter),
          instructions: `${t.instructions}\n\n${v.note}`,
        },
  );
}
