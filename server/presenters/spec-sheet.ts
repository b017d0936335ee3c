import type { MachineSpecSheet } from '../models';
import type { SpecSheet } from '../../shared/schemas/spec-sheet';
import { sheetDataOf } from '../services/spec-sheets';

/** A machine's sheet with every section (empty ones too); `updatedAt` null before any entry. */
export const presentSpecSheet = (machineId: string, row: MachineSpecSheet | null): SpecSheet => ({
  machineId,
  ...sheetDataOf(row),
  updatedAt: row ? row.updatedAt.toISOString() : null,
});
