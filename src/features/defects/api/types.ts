import type { DefectListQuery } from '../../../../shared/schemas/defects';
import type { Machine } from '../../../../shared/schemas/machines';
import type { ServiceRecord } from '../../../../shared/schemas/service-record-responses';

// The defect API's answers are the shared schemas' types (shared/schemas/defects.ts); what
// follows them here are the client's filters and its views of other features' answers.
export type {
  ClosedDefect,
  Defect,
  DefectAbilities,
  DefectList,
  ReportedDefect,
} from '../../../../shared/schemas/defects';
export type { MachineRef, PersonRef } from '../../../../shared/schemas/refs';

/** The list's filters: its query (defectListQuerySchema); the page size is the server's. */
export type DefectFilters = Omit<DefectListQuery, 'pageSize'>;
export type DefectStatusFilter = DefectFilters['status'];

/** A machine to choose in the filters and the report form (from a row of GET machines). */
export type MachineOption = Pick<Machine, 'id' | 'fleetNumber' | 'name' | 'status'>;

/** A completed service record that may have fixed a defect (a row of the machine's history). */
export type CompletedRecord = Pick<
  ServiceRecord,
  'id' | 'performedOn' | 'meterValue' | 'tasks' | 'notes'
>;
