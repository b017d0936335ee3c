// The season services of the service library (shared/domain/service-library/season.ts): which
// classes carry a pre-season and a storage service, their offsets, and that none keeps a yearly
// day interval that would drift into harvest. The offsets are common practice (the library's
// own choice, CHECKS.md §7: no published source gives universal figures), not published values.
import { describe, expect, it } from 'vitest';
import {
  COMMON_PRACTICE_NOTE,
  serviceLibrary,
  serviceLibraryClass,
  type MachineClass,
} from '../../shared/domain/service-library';
import { taskInputSchema } from '../../shared/schemas/schedule';

const seasonTasks = (cls: MachineClass) =>
  serviceLibraryClass(cls).tasks.filter((t) => t.seasonAnchor !== null);
const offsets = (cls: MachineClass) =>
  seasonTasks(cls).map((t) => [t.name, t.seasonAnchor, t.seasonOffsetDays]);

describe('service library — season services', () => {
  it('combine — pre-season inspection 21 days before the start, storage 14 days after the end', () => {
    expect(offsets('combine')).toEqual([
      ['Pre-season inspection', 'before_start', 21],
      ['Storage: clean out and protect', 'after_end', 14],
    ]);
    const storage = seasonTasks('combine')[1];
    expect(storage.instructions).toMatch(/relieve belt tension/);
    expect(storage.instructions).toMatch(/grease every point/i);
  });

  it('self-propelled sprayer — calibration 14 days before, winterising 7 days after, with the chemicals caution', () => {
    expect(offsets('sp_sprayer')).toEqual([
      ['Pre-season calibration', 'before_start', 14],
      ['Storage: flush and winterise the plumbing', 'after_end', 7],
    ]);
    const winterise = seasonTasks('sp_sprayer')[1];
    expect(winterise.hazards).toContain('chemicals');
    expect(winterise.instructions).toMatch(/antifreeze/);
    expect(winterise.instructions).toMatch(/dispose of them as the labels and local rules say/);
  });

  it.each([
    ['sp_windrower', ['before_start', 'after_end']],
    ['forage_harvester', ['before_start', 'after_end']],
    ['mower_conditioner', ['before_start', 'after_end']],
    ['round_baler', ['before_start', 'after_end']],
    ['square_baler', ['before_start', 'before_start', 'after_end']],
    ['grain_truck', ['before_start']],
    ['slurry_tanker', ['after_end']],
    ['implement', ['after_end']],
  ] as [MachineClass, string[]][])('%s — season services %j', (cls, anchors) => {
    expect(seasonTasks(cls).map((t) => t.seasonAnchor)).toEqual(anchors);
  });

  it('year-round classes (tractors, telehandler, mixer wagon) have none', () => {
    for (const cls of [
      'row_crop_tractor',
      'articulated_tractor',
      'utility_loader_tractor',
      'telehandler',
      'mixer_wagon',
    ] as MachineClass[])
      expect(seasonTasks(cls), cls).toEqual([]);
  });

  it('every season service — no day interval, days 0–120, a two-week warning, common practice, valid input — counted', () => {
    const all = serviceLibrary().flatMap((c) => c.tasks.filter((t) => t.seasonAnchor !== null));
    // combine, sprayer, windrower, forage harvester, mower-conditioner, round baler: 2 each (12);
    // square baler 3; grain truck, slurry tanker, implement 1 each: 18
    expect(all.length).toBe(18);
    for (const task of all) {
      expect(task.intervalDays, task.name).toBeNull();
      expect(task.seasonOffsetDays).toBeGreaterThanOrEqual(0);
      expect(task.seasonOffsetDays).toBeLessThanOrEqual(120);
      expect(task.warnDays).toBe(14);
      expect(task.instructions).toContain(COMMON_PRACTICE_NOTE);
      expect(taskInputSchema.safeParse(task).success, task.name).toBe(true);
    }
  });

  it('the yearly coolant freeze-point test before winter stays a day interval', () => {
    const test = serviceLibraryClass('combine').tasks.find(
      (t) => t.name === 'Coolant freeze-point test before winter',
    )!;
    expect([test.intervalDays, test.seasonAnchor]).toEqual([365, null]);
  });
});
