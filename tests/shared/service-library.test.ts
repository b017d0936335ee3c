// The service library (shared/domain/service-library): every interval is common practice (no
// published source gives universal hours — CHECKS.md §7); these tests check its structure and
// the rules the issue sets, not the figures themselves.
import { describe, expect, it } from 'vitest';
import {
  COMMON_PRACTICE_NOTE,
  MACHINE_CLASSES,
  parseMachineClass,
  serviceLibrary,
  serviceLibraryClass,
} from '../../shared/domain/service-library';
import { HAZARDS, taskInputSchema } from '../../shared/schemas/schedule';

const library = serviceLibrary();
const allTasks = library.flatMap((c) => c.tasks.map((t) => ({ cls: c.machineClass, task: t })));

/** Words in a task's name or instructions that mean it carries a hazard, and the tag it needs. */
const HAZARD_WORDS: [RegExp, (typeof HAZARDS)[number][]][] = [
  [/\bPTO\b/, ['pto']],
  [/hydraulic/i, ['hydraulic_pressure']],
  // draining oil or coolant (not water from a fuel separator)
  [/\bdrain\b[^.]*\b(warm|oil|coolant|cooling)\b|\boil\b[^.]*\bdrain/i, ['hot_fluid']],
  [/battery/i, ['battery']],
  [/wheel nut|tyre/i, ['tyres_rims']],
  [/nozzle|charcoal|DEF\b/, ['chemicals']],
];

describe('service library', () => {
  it('covers every machine class, each with its own set of tasks', () => {
    expect(library.map((c) => c.machineClass)).toEqual([...MACHINE_CLASSES]);
    expect(MACHINE_CLASSES).toHaveLength(15);
    const sets = library.map((c) =>
      c.tasks
        .map((t) => t.name)
        .sort()
        .join('|'),
    );
    expect(new Set(sets).size).toBe(library.length);
    for (const c of library) {
      expect(c.tasks.length, c.machineClass).toBeGreaterThanOrEqual(7);
      const names = c.tasks.map((t) => t.name.toLowerCase());
      expect(new Set(names).size, `${c.machineClass}: task names repeat`).toBe(names.length);
    }
  });

  it('every task passes the task schema the API uses, and says its interval is common practice', () => {
    for (const { cls, task } of allTasks) {
      const parsed = taskInputSchema.safeParse(task);
      expect(parsed.success, `${cls} / ${task.name}: ${parsed.error?.message}`).toBe(true);
      expect(task.instructions).toContain(COMMON_PRACTICE_NOTE);
    }
  });

  it('tasks that name a hazard carry its tag — counted, so it cannot pass on an empty list', () => {
    let tagged = 0;
    for (const { cls, task } of allTasks) {
      const text = `${task.name} ${task.instructions.replace(COMMON_PRACTICE_NOTE, '')}`;
      for (const [words, needs] of HAZARD_WORDS) {
        if (!words.test(text)) continue;
        if (needs[0] === 'hydraulic_pressure' && !/hose|filter|line|relieve/i.test(text)) continue;
        for (const h of needs)
          expect(task.hazards, `${cls} / ${task.name} needs ${h}`).toContain(h);
      }
      if (task.hazards.length > 0) tagged += 1;
      for (const h of task.hazards) expect(HAZARDS).toContain(h);
    }
    // 15 classes, most with a PTO shaft, grease points under raised loads, oil drains, battery
    expect(tagged).toBeGreaterThanOrEqual(150);
    const kinds = new Set(allTasks.flatMap(({ task }) => task.hazards));
    expect(kinds.size).toBe(HAZARDS.length);
  });

  it('break-in points come before the first regular interval; there are some on every engine and gearbox', () => {
    let breakIns = 0;
    for (const { cls, task } of allTasks) {
      if (task.firstServiceMeter === null) continue;
      breakIns += 1;
      expect(task.intervalMeter, `${cls} / ${task.name}`).not.toBeNull();
      expect(task.firstServiceMeter, `${cls} / ${task.name}`).toBeLessThan(task.intervalMeter!);
    }
    expect(breakIns).toBeGreaterThanOrEqual(30);
    const filters = serviceLibraryClass('row_crop_tractor').tasks.find(
      (t) => t.name === 'Hydraulic/transmission filters',
    )!;
    expect(filters.firstServiceMeter).toBe(50);
    const gearbox = serviceLibraryClass('round_baler').tasks.find(
      (t) => t.name === 'Main gearbox oil',
    )!;
    expect(gearbox.firstServiceMeter).toBe(50);
    for (const c of library) {
      const nuts = c.tasks.find((t) => t.name === 'Wheel nut torque');
      expect(nuts?.firstServiceMeter, c.machineClass).toBeGreaterThan(0);
    }
  });

  it('fuel, hydraulic and air filters have a calendar limit as well: whichever comes first', () => {
    const filterTasks = allTasks.filter(({ task }) =>
      /fuel filter|hydraulic\/transmission filter|engine air filter|cab (air|charcoal) filter/i.test(
        task.name,
      ),
    );
    // 8 self-propelled classes × 4 filter tasks (fuel, engine air, hydraulic, cab), and the truck's fuel and air filters
    expect(filterTasks.length).toBe(8 * 4 + 2);
    for (const { cls, task } of filterTasks) {
      expect(task.intervalMeter, `${cls} / ${task.name}`).not.toBeNull();
      expect(task.intervalDays, `${cls} / ${task.name}`).toBeGreaterThan(0);
    }
  });

  it('names the items practice adds: axle oil, cab filter, DEF, DPF, valves, freeze test, tanker and mixer items', () => {
    const has = (cls: (typeof MACHINE_CLASSES)[number], name: string) =>
      serviceLibraryClass(cls).tasks.some((t) => t.name === name);
    expect(has('row_crop_tractor', 'Front axle and planetary hub oil')).toBe(true);
    expect(has('row_crop_tractor', 'Cab air filter')).toBe(true);
    expect(has('sp_sprayer', 'Cab charcoal filter')).toBe(true);
    expect(has('sp_sprayer', 'Cab air filter')).toBe(false);
    expect(has('combine', 'DEF filter')).toBe(true);
    expect(has('combine', 'DPF and exhaust aftertreatment check')).toBe(true);
    expect(has('telehandler', 'Engine valve clearance')).toBe(true);
    expect(has('articulated_tractor', 'Coolant freeze-point test before winter')).toBe(true);
    expect(has('slurry_tanker', 'Vacuum-pump oil')).toBe(true);
    expect(has('mixer_wagon', 'Auger knives and flighting')).toBe(true);
    expect(has('mixer_wagon', 'Weigh cells and indicator check')).toBe(true);
  });

  it('greases loader pivots and PTO shaft crosses every 8–10 h, not 50 h', () => {
    const loader = serviceLibraryClass('utility_loader_tractor').tasks.find(
      (t) => t.name === 'Loader pivots and bucket pins',
    )!;
    expect(loader.intervalMeter).toBe(10);
    const shafts = allTasks.filter(
      ({ task }) => task.name === 'PTO shaft crosses and sliding tubes',
    );
    expect(shafts.length).toBe(6); // the six PTO-driven trailed classes
    for (const { task } of shafts) expect(task.intervalMeter).toBeLessThanOrEqual(10);
  });

  it('wear parts are marked and carry no part number; no invented part numbers at all', () => {
    const parts = allTasks.flatMap(({ task }) => task.parts);
    expect(parts.length).toBeGreaterThanOrEqual(30);
    for (const p of parts) {
      expect(p.wearPart).toBe(true);
      expect(p.partNumber).toBe('');
      expect(p.description).toMatch(/as worn$/);
    }
  });

  it('counts the truck in km and the rest in hours; parses class names as typed', () => {
    expect(serviceLibraryClass('grain_truck').meterUnit).toBe('km');
    expect(serviceLibraryClass('combine').meterUnit).toBe('h');
    expect(parseMachineClass('Round baler')).toBe('round_baler');
    expect(parseMachineClass('  round   balers ')).toBe('round_baler');
    expect(parseMachineClass('4WD articulated tractor')).toBe('articulated_tractor');
    expect(parseMachineClass('sp_sprayer')).toBe('sp_sprayer');
    expect(parseMachineClass('Harvester')).toBeNull();
  });
});
