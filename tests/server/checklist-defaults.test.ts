// The built-in walkaround checklists (server/services/checklist-defaults.ts and the lists it
// picks), as pure functions: each list by phase, the items every self-propelled machine needs and
// the items of one machine class. The tractor list's published items and cautions are checked
// through the API in walkarounds-checklist.test.ts; these are the rest, all common practice.
import { describe, expect, it } from 'vitest';
import {
  builtInChecklist,
  defaultChecklist,
  itemsForMachine,
  phaseOf,
} from '../../server/services/checklist-defaults';
import { MACHINE_CATEGORIES, SAFETY_DEFERRAL, type MachineCategory } from '../../shared/constants';
import { hazardCautionText } from '../../shared/domain/hazards';
import {
  MACHINE_CLASS_CATEGORY,
  type MachineClass,
} from '../../shared/domain/service-library/classes';
import type { ChecklistItem } from '../../server/models/walkaround';

const SELF_PROPELLED: MachineCategory[] = [
  'tractor',
  'combine',
  'sprayer',
  'loader',
  'mower',
  'other',
];
// The classes that drive themselves (the trailed mower-conditioner, balers, wagons, the tanker
// and the generic implement do not; the grain truck has its own road list, without pedal latch).
const SELF_PROPELLED_CLASSES: MachineClass[] = [
  'row_crop_tractor',
  'articulated_tractor',
  'utility_loader_tractor',
  'combine',
  'sp_sprayer',
  'sp_windrower',
  'forage_harvester',
  'telehandler',
];
// every self-propelled list as a machine walks it: each category without a class, each class in
// the list of the category it usually has
const walked: [string, ChecklistItem[]][] = [
  ...SELF_PROPELLED.map((c): [string, ChecklistItem[]] => [c, defaultChecklist(c).items]),
  ...SELF_PROPELLED_CLASSES.map((c): [string, ChecklistItem[]] => [
    `${MACHINE_CLASS_CATEGORY[c]} · ${c}`,
    defaultChecklist(MACHINE_CLASS_CATEGORY[c], c).items,
  ]),
];
const ids = (items: ChecklistItem[]) => items.map((i) => i.id);
const byId = (items: ChecklistItem[], id: string) => items.find((i) => i.id === id);

describe('checklist defaults — every self-propelled list', () => {
  it.each(walked)(
    '%s — brakes, parking brake, pedal latch and steering, critical and checked running',
    (_name, items) => {
      // common practice: a machine that moves itself is not used with brakes or steering unchecked
      for (const id of ['brakes', 'parking-brake', 'brake-pedal-latch', 'steering']) {
        const item = byId(items, id);
        expect(item, id).toBeDefined();
        expect(item).toMatchObject({ critical: true, phase: 'running' });
      }
      expect(byId(items, 'parking-brake')!.label).toMatch(/parking brake/i);
    },
  );

  it.each(walked)('%s — both phases, the walk round before the seat', (_name, items) => {
    const phases = items.map(phaseOf);
    const firstRunning = phases.indexOf('running');
    expect(firstRunning).toBeGreaterThan(0);
    expect(phases.slice(firstRunning).every((p) => p === 'running')).toBe(true);
    // the walk round is the long half: fluids, tyres, hoses, guards
    expect(firstRunning).toBeGreaterThanOrEqual(8);
    expect(new Set(ids(items)).size).toBe(items.length);
  });
});

describe('checklist defaults — the items of a machine class', () => {
  it('combine and forage harvester — radiator, rotary screen and precleaner, before start', () => {
    for (const items of [
      defaultChecklist('combine').items,
      defaultChecklist('combine', 'combine').items,
      defaultChecklist('other', 'forage_harvester').items,
    ])
      for (const id of ['radiator', 'rotary-screen', 'precleaner'])
        expect(byId(items, id), id).toMatchObject({ phase: 'before_start' });
    // a self-propelled machine of no class in the same list does not get the harvester's screens
    expect(ids(defaultChecklist('other').items)).not.toContain('rotary-screen');
    expect(ids(defaultChecklist('other', 'forage_harvester').items)).toContain('cutterhead');
  });

  it('telehandler — a load-moment indicator test from the seat, critical, with its caution', () => {
    const lmi = byId(defaultChecklist('loader', 'telehandler').items, 'lmi-test')!;
    expect(lmi).toMatchObject({
      label: 'Load-moment indicator test',
      critical: true,
      phase: 'running',
      hazards: ['raised_load', 'power_lines'],
    });
    expect(lmi.guidance).toMatch(/Never test it by lifting more than the load chart allows/);
    // the caution is the hazard table's, ending with the deferral to the manual
    expect(lmi.caution).toBe(hazardCautionText(['raised_load', 'power_lines']));
    expect(lmi.caution.endsWith(SAFETY_DEFERRAL)).toBe(true);
    // a loader of no class (a wheel loader, a skid steer) has no such indicator to test
    expect(ids(defaultChecklist('loader').items)).not.toContain('lmi-test');
  });

  it('utility tractor with loader — loader lowered, pins, hoses and tool lock; a row-crop tractor has none', () => {
    const loaderTractor = defaultChecklist('tractor', 'utility_loader_tractor').items;
    const loaderItems = ['loader-lowered', 'loader-pins', 'loader-hoses', 'tool-lock'];
    for (const id of loaderItems)
      expect(byId(loaderTractor, id), id).toMatchObject({ critical: true, phase: 'before_start' });
    // lowered first: nobody walks round under a raised loader
    expect(loaderTractor[0].id).toBe('loader-lowered');
    expect(byId(loaderTractor, 'loader-hoses')!.hazards).toEqual(['hydraulic_pressure']);
    for (const other of [
      defaultChecklist('tractor').items,
      defaultChecklist('tractor', 'row_crop_tractor').items,
    ])
      expect(ids(other).filter((id) => loaderItems.includes(id))).toEqual([]);
  });
});

describe('checklist defaults — every list and item', () => {
  it.each(MACHINE_CATEGORIES)(
    '%s — cautions from the hazard table, classes of this category',
    (category) => {
      const { items } = builtInChecklist(category);
      let withHazards = 0;
      for (const item of items) {
        expect(item.caution).toBe(hazardCautionText(item.hazards));
        if (item.hazards.length) withHazards += 1;
        for (const c of item.classes ?? []) expect(MACHINE_CLASS_CATEGORY[c]).toBe(category);
      }
      // every list has something that can hurt (hoses, shields, PTO, hitch): it cannot pass empty
      expect(withHazards).toBeGreaterThan(0);
    },
  );

  it('itemsForMachine — a stored item without phase or classes is walked before start, on every machine', () => {
    const legacy = {
      id: 'old',
      label: 'Old item',
      guidance: '',
      critical: false,
      hazards: [],
      caution: '',
    };
    const seat = { ...legacy, id: 'seat', phase: 'running' as const };
    const loader = { ...legacy, id: 'loader', classes: ['utility_loader_tractor' as const] };
    expect(ids(itemsForMachine([seat, legacy, loader], null))).toEqual(['old', 'seat']);
    expect(ids(itemsForMachine([seat, legacy, loader], 'utility_loader_tractor'))).toEqual([
      'old',
      'loader',
      'seat',
    ]);
  });
});

describe('checklist defaults — trailed machines', () => {
  it.each([
    'mower_conditioner',
    'round_baler',
    'square_baler',
    'mixer_wagon',
    'slurry_tanker',
  ] as const)(
    '%s — walked round as a towed machine: no pedal latch or steering of its own to check',
    (c) => {
      const items = ids(defaultChecklist(MACHINE_CLASS_CATEGORY[c], c).items);
      // common practice: a trailed machine has no seat, pedals or steering to check
      expect(items).not.toContain('brake-pedal-latch');
      expect(items).not.toContain('steering');
      expect(items.length).toBeGreaterThan(3);
    },
  );
});
