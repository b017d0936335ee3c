import { outOfSpecDefect, testConditionsWords } from '../../shared/domain/measurement-spec';
import type { ServiceRecord } from '../../shared/schemas/service-record-responses';
import type { SpecSheet } from '../../shared/schemas/spec-sheet';
import type { OutOfSpecItem } from '../features/defects/components/out-of-spec-defects';

/** The test of the machine's sheet a measurement of this name is held to (case and spaces aside). */
export const sheetTestFor = (tests: SpecSheet['testPressures'], name: string) =>
  tests.find((t) => t.name.trim().toLowerCase() === name.trim().toLowerCase()) ?? null;

/**
 * A record's measurements outside their spec, each with the defect it raises: the visit's date and
 * meter, and the conditions the sheet gives for a test of that name.
 */
export function outOfSpecItems(
  record: ServiceRecord,
  tests: SpecSheet['testPressures'],
): OutOfSpecItem[] {
  return record.measurements.flatMap((m) => {
    const test = sheetTestFor(tests, m.name);
    const defect = outOfSpecDefect(m, {
      performedOn: record.performedOn,
      meterValue: record.meterValue,
      meterUnit: record.machine.meterUnit,
      conditions: test ? testConditionsWords(test) : '',
    });
    return defect ? [{ ...m, defect }] : [];
  });
}
