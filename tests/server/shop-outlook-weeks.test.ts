import { describe, expect, it } from 'vitest';
import { outlookWeeks, weekIndexOf } from '../../server/services/shop-outlook-weeks';
import type { OutlookPlan, OutlookService } from '../../shared/schemas/shop-outlook';

// The outlook's week arithmetic as pure functions, on hand-worked dates: the weeks start on
// Monday 2027-03-01 (2027-03-01 is a Monday: ISO week 2027-W09, by the ISO 8601 rule that a
// week belongs to the year of its Thursday, 2027-03-04).
const START = '2027-03-01';
const machine = { id: 'm1', fleetNumber: 'T-01', name: 'Tractor' };
const service = (over: Partial<OutlookService>): OutlookService => ({
  taskId: 't',
  taskName: 'Task',
  machine,
  customer: null,
  status: 'ok',
  dueOn: null,
  labourHours: null,
  plannedOn: null,
  ...over,
});
const plan = (over: Partial<OutlookPlan>): OutlookPlan => ({
  id: 'p',
  plannedFor: START,
  machine,
  customer: null,
  tasks: 1,
  labourHours: 1,
  labourUnknown: 0,
  ...over,
});

describe('shop outlook weeks — which week, and each week’s sums', () => {
  it.each([
    ['overdue, dated long before', { status: 'overdue' as const, dueOn: '2026-12-01' }, 0],
    ['the Monday', { dueOn: '2027-03-01' }, 0],
    ['the first Sunday', { dueOn: '2027-03-07' }, 0],
    ['the second Monday', { dueOn: '2027-03-08' }, 1],
    ['the last day of week 4', { dueOn: '2027-03-28' }, 3],
    ['the day after week 4', { dueOn: '2027-03-29' }, null],
    ['no date (no forecast)', { status: 'no_forecast' as const, dueOn: null }, null],
  ])('weekIndexOf — %s → %s', (_name, over, expected) => {
    expect(weekIndexOf(service(over), START, 4)).toBe(expected);
  });

  it('outlookWeeks — 4 weeks: labour summed with those without an estimate counted; plans before the start in week 1, after the end in none; proposed bookings apart', () => {
    const weeks = outlookWeeks(
      START,
      4,
      [
        {
          service: service({ taskId: 'a', dueOn: '2027-03-02', labourHours: 1.25 }),
          parts: [],
          fluids: [],
        },
        { service: service({ taskId: 'b', dueOn: '2027-03-03' }), parts: [], fluids: [] },
        {
          service: service({
            taskId: 'c',
            dueOn: '2027-03-16',
            labourHours: 2,
            plannedOn: '2027-03-15',
          }),
          parts: [{ partNumber: 'AF-1', description: 'Air filter', quantity: 2 }],
          fluids: [{ kind: 'Engine oil', volume: 10, unit: 'L' }],
        },
        {
          service: service({ taskId: 'd', dueOn: '2027-04-20', labourHours: 9 }),
          parts: [],
          fluids: [],
        },
      ],
      [
        plan({ id: 'old', plannedFor: '2027-02-20', labourHours: 3, labourUnknown: 1 }),
        plan({ id: 'w3', plannedFor: '2027-03-15', labourHours: 2 }),
        plan({ id: 'late', plannedFor: '2027-04-01', labourHours: 5 }),
      ],
      'metric',
      [plan({ id: 'bk', plannedFor: '2027-03-09', labourHours: 1.5 })],
    );
    expect(weeks.map((w) => [w.isoWeek, w.start, w.end])).toEqual([
      ['2027-W09', '2027-03-01', '2027-03-07'],
      ['2027-W10', '2027-03-08', '2027-03-14'],
      ['2027-W11', '2027-03-15', '2027-03-21'],
      ['2027-W12', '2027-03-22', '2027-03-28'],
    ]);
    // week 1: a 1.25 h + b (no estimate) = 1.25 h, 1 unknown; the old plan 3 h (1 task unknown)
    expect(weeks[0]).toMatchObject({
      labourHours: 1.25,
      labourUnknown: 1,
      unplannedLabourHours: 1.25,
      plannedLabourHours: 3,
      plannedLabourUnknown: 1,
    });
    expect(weeks[0].planned.map((p) => p.id)).toEqual(['old']);
    expect(weeks[1]).toMatchObject({ services: [], labourHours: 0, planned: [] });
    // a booking proposed for Tue 9 Mar, beside (not in) the planned labour of week 2
    expect(weeks[1].proposed.map((p) => p.id)).toEqual(['bk']);
    expect(weeks[1]).toMatchObject({ proposedLabourHours: 1.5, plannedLabourHours: 0 });
    // week 3: c 2 h, on a plan (none unplanned); its parts and oil, needed on its date
    expect(weeks[2]).toMatchObject({
      labourHours: 2,
      unplannedLabourHours: 0,
      plannedLabourHours: 2,
    });
    expect(weeks[2].parts).toEqual([
      {
        partNumber: 'AF-1',
        description: 'Air filter',
        quantity: 2,
        machines: 1,
        services: 1,
        firstNeededOn: '2027-03-16',
      },
    ]);
    expect(weeks[2].fluids).toMatchObject([{ kind: 'Engine oil', unit: 'L', volume: 10 }]);
    // d (20 Apr) and the late plan (1 Apr) fall after the four weeks
    expect(weeks.flatMap((w) => w.services.map((s) => s.taskId))).toEqual(['a', 'b', 'c']);
    expect(weeks.flatMap((w) => w.planned.map((p) => p.id))).toEqual(['old', 'w3']);
  });
});
