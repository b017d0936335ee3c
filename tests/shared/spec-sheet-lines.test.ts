// Task lines from the machine's spec sheet (shared/domain/spec-sheet-lines.ts): two tractors of one
// class with two sheets change different quantities. The figures are invented for the test and
// worked by hand in the comments; the links of the library's tasks are sheet-links.ts.
import { describe, expect, it } from 'vitest';
import { taskLinesFromSheet, type TaskLines } from '../../shared/domain/spec-sheet-lines';
import { serviceLibraryClass } from '../../shared/domain/service-library';
import { SHEET_LINKED_TASK_NAMES } from '../../shared/domain/service-library/sheet-links';
import type { SpecSheetData } from '../../shared/schemas/spec-sheet';

type Sheet = Pick<SpecSheetData, 'capacities' | 'filters'>;

// Tractor A, metric: engine 17.5 L, hydraulic/transmission 110 L, front axle 9.5 L, coolant 28 L.
const SHEET_A: Sheet = {
  capacities: {
    engineOil: { quantity: 17.5, unit: 'L', spec: 'SAE 15W-40, API CK-4' },
    hydraulicTransmission: { quantity: 110, unit: 'L', spec: '' },
    frontAxle: { quantity: 9.5, unit: 'L', spec: '' },
    coolant: { quantity: 28, unit: 'L', spec: '' },
    fuel: { quantity: 380, unit: 'L', spec: '' },
  },
  filters: { engineOil: 'BR-OF-118', fuelPrimary: 'BR-FP-20', fuelSecondary: 'BR-FS-21' },
};
// Tractor B, US gallons: engine 4.5, hydraulic/transmission 29, front axle 2.5, coolant 7.5.
const SHEET_B: Sheet = {
  capacities: {
    engineOil: { quantity: 4.5, unit: 'gal', spec: '' },
    hydraulicTransmission: { quantity: 29, unit: 'gal', spec: '' },
    frontAxle: { quantity: 2.5, unit: 'gal', spec: '' },
    coolant: { quantity: 7.5, unit: 'gal', spec: '' },
  },
  filters: { engineOil: 'TM-77' },
};

const rowCropTasks = (): TaskLines[] =>
  serviceLibraryClass('row_crop_tractor').tasks.map((t) => ({
    name: t.name,
    parts: t.parts,
    fluids: t.fluids,
  }));

/** Every fluid line of the class's tasks once the sheet has filled them. */
const fluidsFrom = (sheet: Sheet) =>
  rowCropTasks().flatMap((t) => taskLinesFromSheet(t, sheet).fluids);

describe('task lines from the spec sheet', () => {
  it('two row-crop tractors, two sheets — each change takes its own sheet: 165 L against 43.5 US gal (hand-worked)', () => {
    // A: 17.5 + 110 + 9.5 + 28 = 165 L; fuel is a tank, never a change, so its 380 L is not used
    const a = fluidsFrom(SHEET_A);
    expect(a.map((f) => [f.capacity, f.volume, f.unit])).toEqual([
      ['engineOil', 17.5, 'L'],
      ['hydraulicTransmission', 110, 'L'],
      ['coolant', 28, 'L'],
      ['frontAxle', 9.5, 'L'],
    ]);
    expect(a.reduce((sum, f) => sum + f.volume, 0)).toBe(165);
    // B: 4.5 + 29 + 2.5 + 7.5 = 43.5 US gal
    const b = fluidsFrom(SHEET_B);
    expect(b.every((f) => f.unit === 'gal')).toBe(true);
    expect(b.reduce((sum, f) => sum + f.volume, 0)).toBe(43.5);
  });

  it("engine oil and filter — the sheet's fluid names the line and its filter number becomes the part", () => {
    const task = { name: 'Engine oil and filter', parts: [], fluids: [] };
    const a = taskLinesFromSheet(task, SHEET_A);
    expect(a.fluids).toEqual([
      { kind: 'Engine oil, SAE 15W-40, API CK-4', volume: 17.5, unit: 'L', capacity: 'engineOil' },
    ]);
    expect(a.parts).toEqual([
      {
        partNumber: 'BR-OF-118',
        description: 'Engine oil filter',
        quantity: 1,
        wearPart: false,
        filterRole: 'engineOil',
      },
    ]);
    expect(taskLinesFromSheet(task, SHEET_B).parts[0].partNumber).toBe('TM-77');
    expect(a.changed).toBe(true);
  });

  it('a linked line already filled — the sheet changes it, and a second pass changes nothing', () => {
    const once = taskLinesFromSheet({ name: 'Coolant change', parts: [], fluids: [] }, SHEET_A);
    const again = taskLinesFromSheet({ name: 'Coolant change', ...once }, SHEET_B);
    expect(again.fluids).toEqual([
      { kind: 'Coolant', volume: 7.5, unit: 'gal', capacity: 'coolant' },
    ]);
    expect(taskLinesFromSheet({ name: 'Coolant change', ...again }, SHEET_B).changed).toBe(false);
  });

  it('lines typed by hand — kept as typed, and the library link adds no second oil line or filter', () => {
    const task: TaskLines = {
      name: 'Engine oil and filter',
      parts: [{ partNumber: 'OF-100', description: 'Oil filter', quantity: 1, wearPart: false }],
      fluids: [{ kind: 'Engine oil 10W-30', volume: 38, unit: 'L' }],
    };
    const out = taskLinesFromSheet(task, SHEET_A);
    expect(out).toEqual({ parts: task.parts, fluids: task.fluids, changed: false });
  });

  it('a wear part on the task — does not stand for the filter: the filter is still added', () => {
    const task: TaskLines = {
      name: 'Engine air filter',
      parts: [{ partNumber: '', description: 'Intake hose', quantity: 1, wearPart: true }],
      fluids: [],
    };
    const sheet: Sheet = { capacities: {}, filters: { airOuter: 'AF-9' } };
    expect(taskLinesFromSheet(task, sheet).parts.map((p) => p.partNumber)).toEqual(['', 'AF-9']);
  });

  it('the sheet clears a figure — its linked line goes; a compartment with only a specification gives none', () => {
    const filled = taskLinesFromSheet(
      { name: 'Engine oil and filter', parts: [], fluids: [] },
      SHEET_A,
    );
    const cleared: Sheet = {
      capacities: { engineOil: { quantity: null, unit: 'L', spec: 'SAE 10W-30' } },
      filters: {},
    };
    const out = taskLinesFromSheet({ name: 'Engine oil and filter', ...filled }, cleared);
    expect(out).toEqual({ parts: [], fluids: [], changed: true });
  });

  it('a task the library does not link — untouched by any sheet', () => {
    const task = { name: 'Straw chopper knives', parts: [], fluids: [] };
    expect(taskLinesFromSheet(task, SHEET_A).changed).toBe(false);
  });

  it('every linked name is a task of the library (a renamed task would lose its link)', () => {
    const names = new Set(
      [
        'row_crop_tractor',
        'articulated_tractor',
        'combine',
        'sp_sprayer',
        'telehandler',
        'grain_truck',
      ]
        .flatMap((c) => serviceLibraryClass(c as 'combine').tasks)
        .map((t) => t.name),
    );
    expect(SHEET_LINKED_TASK_NAMES.length).toBeGreaterThan(10);
    for (const name of SHEET_LINKED_TASK_NAMES) expect(names, name).toContain(name);
  });
});
