// The walkaround form's sections (src/features/walkarounds/lib/sections.ts): the checklist by
// phase — before start, then in the seat with the engine running — and a long phase in even runs.
// Expected titles and runs are worked out by hand beside each case.
import { describe, expect, it } from 'vitest';
import { checklistSections } from '../../src/features/walkarounds/lib/sections';
import type { ChecklistItem } from '../../src/features/walkarounds/api/types';

const item = (id: string, phase: ChecklistItem['phase'] = 'before_start'): ChecklistItem => ({
  id,
  label: `Check ${id}`,
  guidance: '',
  critical: false,
  hazards: [],
  caution: '',
  phase,
  classes: [],
});
const many = (n: number, phase: ChecklistItem['phase'], from = 1) =>
  Array.from({ length: n }, (_, i) => item(`${phase}-${from + i}`, phase));

describe('walkaround sections — by phase', () => {
  it('4 before start, 3 running, interleaved — two sections, before start first, numbered as walked', () => {
    const items = [
      item('oil'),
      item('brakes', 'running'),
      item('tyres'),
      item('steering', 'running'),
      item('hoses'),
      item('lights', 'running'),
      item('guards'),
    ];
    const sections = checklistSections(items);
    expect(sections.map((s) => s.title)).toEqual([
      'Before start — engine off, key out',
      'In the seat, engine running',
    ]);
    expect(sections[0].items.map(({ item: i }) => i.id)).toEqual([
      'oil',
      'tyres',
      'hoses',
      'guards',
    ]);
    expect(sections[1].items.map(({ item: i, position }) => [i.id, position])).toEqual([
      ['brakes', 5],
      ['steering', 6],
      ['lights', 7],
    ]);
    expect(sections[0].intro).toMatch(/engine off, the key in your pocket/);
    expect(sections[1].intro).toMatch(/parking brake on/);
  });

  it('20 before start and 9 running — runs of 5, 5, 5, 5 then 5, 4 (ceil(20/6) = 4 runs; ceil(9/6) = 2)', () => {
    const sections = checklistSections([...many(20, 'before_start'), ...many(9, 'running')]);
    expect(sections.map((s) => [s.title, s.items.length])).toEqual([
      ['Before start — engine off, key out · items 1–5', 5],
      ['Before start — engine off, key out · items 6–10', 5],
      ['Before start — engine off, key out · items 11–15', 5],
      ['Before start — engine off, key out · items 16–20', 5],
      ['In the seat, engine running · items 21–25', 5],
      ['In the seat, engine running · items 26–29', 4],
    ]);
    // the phase's way of standing is said once, above its first run
    expect(sections.map((s) => s.intro !== null)).toEqual([true, false, false, false, true, false]);
    expect(new Set(sections.map((s) => s.key)).size).toBe(sections.length);
  });

  it('a list kept on the phone before phases (no phase on its items) — one before-start section', () => {
    const old = [item('a'), item('b')].map(({ phase: _phase, ...rest }) => rest as ChecklistItem);
    const sections = checklistSections(old);
    expect(sections).toHaveLength(1);
    expect(sections[0]).toMatchObject({
      phase: 'before_start',
      title: 'Before start — engine off, key out',
    });
  });

  it('only running items (a custom list) — no empty before-start section', () => {
    const sections = checklistSections(many(2, 'running'));
    expect(sections.map((s) => s.title)).toEqual(['In the seat, engine running']);
  });
});
