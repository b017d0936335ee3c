import type { MeterReading, MeterReplacement } from '../models';
import type {
  MeterReplacement as MeterReplacementJson,
  Reading,
} from '../../shared/schemas/readings';
import { apiKeyNameOf } from '../../shared/domain/telematics-source';

export const presentReading = (r: MeterReading): Reading => ({
  id: r.id,
  meterId: r.meterId,
  value: r.value,
  lifetimeValue: r.lifetimeValue,
  takenAt: r.takenAt.toISOString(),
  source: r.source,
  sourceName: r.source === 'telematics' ? apiKeyNameOf(r.importKey) : null,
  enteredBy: r.enteredBy,
});

export const presentReplacement = (r: MeterReplacement): MeterReplacementJson => ({
  id: r.id,
  meterId: r.meterId,
  kind: r.kind,
  replacedAt: r.replacedAt.toISOString(),
  oldFinalValue: r.oldFinalValue,
  newStartValue: r.newStartValue,
  note: r.note,
});
