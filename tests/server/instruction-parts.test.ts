import { describe, expect, it } from 'vitest';
import { buildTemplates } from '../../server/seeders/templates';

// A task's instructions that name a part the task's parts list lacks send the technician to the
// shop without it, and leave the part out of the parts to pull and the dealer's forecast. The demo
// farms' tasks are written from these templates (server/seeders/demo-schedules.ts), so checking the
// templates checks the demo schedules too.

/** Part numbers in the demo's series (HS-OF-1120 …), and any number some task of the set lists. */
function partNumbersNamed(text: string, known: Set<string>): string[] {
  const found = new Set(text.match(/\b[A-Z]{2}-[A-Z]{2}-\d{4}\b/g) ?? []);
  for (const number of known) if (text.includes(number)) found.add(number);
  return [...found];
}

describe('demo schedules — instructions and parts lists agree', () => {
  for (const units of ['metric', 'imperial'] as const) {
    it(`templates — ${units} — every part number an instruction names is in that task's parts list`, () => {
      const templates = buildTemplates(units);
      const known = new Set(
        templates.flatMap((t) => t.tasks.flatMap((task) => task.parts.map((p) => p.partNumber))),
      );
      const missing: string[] = [];
      let checked = 0;
      for (const template of templates)
        for (const task of template.tasks) {
          const listed = new Set(task.parts.map((p) => p.partNumber));
          for (const number of partNumbersNamed(task.instructions, known)) {
            checked += 1;
            if (!listed.has(number)) missing.push(`${template.category}: ${task.name} — ${number}`);
          }
        }
      expect(missing).toEqual([]);
      // the air filter inspections of the engine items and the truck name their elements: one per
      // engine-driven category at least, so an empty check cannot pass
      expect(checked).toBeGreaterThanOrEqual(5);
    });
  }

  it('the check finds a part number an instruction names', () => {
    expect(
      partNumbersNamed('Replace the element (HS-AF-1126) when restricted.', new Set()),
    ).toEqual(['HS-AF-1126']);
    expect(partNumbersNamed('Fit a new X-9 seal.', new Set(['X-9']))).toEqual(['X-9']);
  });
});
