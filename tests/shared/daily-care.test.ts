import { describe, expect, it } from 'vitest';
import { careSinceText, careState, type CareFacts } from '../../shared/domain/daily-care';
import { serviceLibrary, serviceLibraryClass } from '../../shared/domain/service-library';
import { hazardAdvice } from '../../shared/domain/hazards';

// Daily care (issue 11): the states and words of a grease round or daily item, worked by hand, and
// the library's daily care. Intervals are common practice (grease rounds of 8–10 h, daily items
// each working day, CHECKS.md §7), not manufacturers' figures.

const grease: CareFacts = {
  name: 'Loader pivots and bucket pins',
  instructions:
    'Bucket on the ground. Grease every loader pivot, the bucket and quick-coupler pins.',
  intervalMeter: 10,
  intervalDays: null,
  lastDoneOn: '2026-04-05',
  lastDoneMeter: 1988,
  sinceMeter: 12,
};

describe('daily care — states and words', () => {
  it('state — past its due point is overdue even when done today; else done today, else not yet today', () => {
    // a 14 h harvest day outruns a 10 h grease round greased this morning
    expect(careState('overdue', '2026-04-07', '2026-04-07')).toBe('overdue');
    expect(careState('ok', '2026-04-07', '2026-04-07')).toBe('done_today');
    expect(careState('due_soon', '2026-04-06', '2026-04-07')).toBe('not_today');
    expect(careState('history_unknown', null, '2026-04-07')).toBe('not_today');
  });

  it('words — "Last greased 12 h ago, every 10 h" (2,000 − 1,988 h); today; never; by date alone', () => {
    expect(careSinceText(grease, 'h', '2026-04-07')).toBe('Last greased 12 h ago, every 10 h');
    // a daily item that is no grease round is "done"
    expect(
      careSinceText(
        { ...grease, name: 'Radiator screen: blow out', instructions: 'Blow it out.' },
        'h',
        '2026-04-07',
      ),
    ).toBe('Last done 12 h ago, every 10 h');
    expect(
      careSinceText({ ...grease, lastDoneOn: '2026-04-07', sinceMeter: 0 }, 'h', '2026-04-07'),
    ).toBe('Last greased today, every 10 h');
    expect(
      careSinceText(
        {
          ...grease,
          name: 'Fuel water separator',
          instructions: '',
          lastDoneOn: null,
          lastDoneMeter: null,
          sinceMeter: null,
        },
        'h',
        '2026-04-07',
      ),
    ).toBe('Not signed off yet, every 10 h');
    expect(
      careSinceText(
        {
          ...grease,
          name: 'DEF level',
          instructions: '',
          intervalMeter: null,
          intervalDays: 1,
          sinceMeter: null,
        },
        'h',
        '2026-04-07',
      ),
    ).toBe('Last done 5 Apr 2026, every day');
  });
});

describe('daily care — the service library', () => {
  const library = serviceLibrary();
  const SELF_PROPELLED = [
    'row_crop_tractor',
    'articulated_tractor',
    'utility_loader_tractor',
    'combine',
    'sp_sprayer',
    'sp_windrower',
    'forage_harvester',
    'telehandler',
  ] as const;

  it('grease rounds of a working day or less (≤ 10 h) are daily care; 50 h rounds stay with the shop', () => {
    const rounds = library.flatMap((c) =>
      c.tasks.filter((t) => /grease|PTO shaft crosses/i.test(t.name) && t.intervalMeter !== null),
    );
    const daily = rounds.filter((t) => t.intervalMeter! <= 10);
    // counted, so the rule cannot pass on an empty library
    expect(daily.length).toBeGreaterThanOrEqual(12);
    for (const t of daily) expect(t.dailyCare, t.name).toBe(true);
    for (const t of rounds.filter((r) => r.intervalMeter! > 10))
      expect(t.dailyCare, t.name).toBe(false);
    expect(
      serviceLibraryClass('utility_loader_tractor').tasks.find(
        (t) => t.name === 'Loader pivots and bucket pins',
      )!.dailyCare,
    ).toBe(true);
  });

  it('every self-propelled class has the daily items: water separator, DEF where fitted, radiator screen (harvesters: their daily clean-down)', () => {
    for (const cls of SELF_PROPELLED) {
      const care = serviceLibraryClass(cls).tasks.filter((t) => t.dailyCare);
      const names = care.map((t) => t.name);
      expect(names, cls).toContain('Fuel water separator: let the water out');
      const screen =
        cls === 'combine' || cls === 'forage_harvester'
          ? 'Daily clean-down and radiator screen'
          : 'Radiator screen: blow out';
      expect(names, cls).toContain(screen);
      // the utility loader tractor's engine has no DEF (engineTasks({ def: false }))
      expect(names.includes('DEF level: check and top up'), cls).toBe(
        cls !== 'utility_loader_tractor',
      );
    }
  });

  it('every daily-care task of the library counts by the meter in a working day or less and carries a caution', () => {
    const care = library.flatMap((c) => c.tasks.filter((t) => t.dailyCare));
    expect(care.length).toBeGreaterThanOrEqual(8 * 3);
    for (const t of care) {
      expect(t.intervalMeter, t.name).toBeLessThanOrEqual(10);
      expect(t.intervalDays, t.name).toBeNull();
      expect(t.hazards.length, t.name).toBeGreaterThan(0);
      for (const h of t.hazards) expect(hazardAdvice(h), `${t.name}: ${h}`).not.toBe('');
    }
  });
});
