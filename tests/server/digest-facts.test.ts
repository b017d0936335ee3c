// The digest's facts of one task (server/services/digest.ts taskFacts) in the words of every
// screen; expected strings written by hand.
import { describe, expect, it } from 'vitest';
import { taskFacts } from '../../server/services/digest';
import type { DueRow } from '../../shared/schemas/due';

const row = (due: Partial<DueRow['due']>, dueOnMeter: number | null): DueRow => ({
  taskId: 't',
  taskName: 'Engine oil and filter',
  hazards: [],
  labourHours: null,
  machine: {
    id: 'm',
    fleetNumber: 'OD-01',
    name: 'Tractor',
    category: 'tractor',
    status: 'in_service',
    restricted: false,
    meterUnit: 'h',
  },
  meter: { id: 'mm', kind: 'engine_hours', label: '', isPrimary: true },
  due: {
    status: 'ok',
    governs: 'meter',
    dueMeter: null,
    dueDate: null,
    projectedDate: null,
    projectedLow: null,
    projectedHigh: null,
    effectiveDate: null,
    remainingMeter: null,
    remainingDays: null,
    basis: 'recorded',
    ...due,
  },
  lastReading: null,
  dueOnMeter,
  usage: null,
});

describe('digest task facts', () => {
  it('replaced meter — due at the value of the meter fitted now, lifetime in brackets; overdue says how far', () => {
    // lifetime due 1,956.3 h; the new meter reads 38 h past its 250 h mark (offset 1,706.3 h)
    const facts = taskFacts(
      row(
        { status: 'overdue', dueMeter: 1956.3, remainingMeter: -38, effectiveDate: '2026-04-07' },
        250,
      ),
    );
    expect(facts).toEqual(['Due at 250 h (1,956.3 h lifetime) — 38 h over', 'Overdue: 38 h over']);
  });

  it('calendar task — the limit with the days left, then when it falls due', () => {
    const facts = taskFacts(
      row({ dueDate: '2026-04-12', remainingDays: 5, effectiveDate: '2026-04-12' }, null),
    );
    expect(facts).toEqual([
      'Calendar limit Sun, Apr 12, 2026 (5 days left)',
      'Falls due Sun, Apr 12, 2026',
    ]);
  });

  it('past its calendar limit — overdue and by how much; the meter projection into next season is not said', () => {
    // like the demo's S-01: 12 days past its date, its meter projected across the idle months
    const facts = taskFacts(
      row(
        {
          status: 'overdue',
          governs: 'calendar',
          dueDate: '2026-03-31',
          remainingDays: -12,
          effectiveDate: '2026-03-31',
          projectedDate: '2026-09-20',
          projectedLow: '2026-09-02',
          projectedHigh: '2027-08-16',
          outcomes: {
            thisSeason: { from: '2026-09-02', to: '2026-10-31' },
            nextSeason: { from: '2027-08-01', to: '2027-08-16' },
            likelier: 'this_season',
          },
        },
        null,
      ),
    );
    expect(facts).toEqual([
      'Calendar limit Tue, Mar 31, 2026 (12 days over)',
      'Overdue: 12 days over',
    ]);
  });
});
