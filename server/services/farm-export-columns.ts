// The shape of a farm export's tables, where its stored files go, and the columns most tables share.

/** [column name, what it holds, SQL expression (default t.<name>)] */
export type ExportColumn = readonly [name: string, doc: string, sql?: string];

export interface ExportTable {
  file: string;
  about: string;
  /** FROM clause; the exported table is `t` */
  from: string;
  /** a total order (ends with a unique column) so pages never overlap */
  orderBy: string;
  columns: readonly ExportColumn[];
}

/** Where each stored file goes in the archive (SQL over the row `t`), and its object's key. */
export const FILE_PATHS = {
  machinePhoto: {
    path: "'files/machine-photos/' || t.id || '.webp'",
    key: "t.photo_key || '.webp'",
  },
  serviceAttachment: {
    path: "'files/service-records/' || t.service_record_id || '/' || t.id || CASE WHEN t.kind = 'pdf' THEN '.pdf' ELSE '.webp' END",
    key: "t.object_key || CASE WHEN t.kind = 'pdf' THEN '.pdf' ELSE '.webp' END",
  },
  walkaroundPhoto: {
    path: "'files/walkaround-photos/' || t.id || '.webp'",
    key: "t.object_key || '.webp'",
  },
} as const;

/** Columns many tables carry, documented once. */
export const COMMON_COLUMNS = {
  id: ['id', 'Hourstone id of the row (UUID)'] as ExportColumn,
  machineId: ['machine_id', 'id of the machine (machines.csv)'] as ExportColumn,
  createdAt: ['created_at', 'when the row was created (ISO 8601, UTC)'] as ExportColumn,
  updatedAt: ['updated_at', 'when the row last changed (ISO 8601, UTC)'] as ExportColumn,
  person: (name: string, what: string): ExportColumn => [
    name,
    `user id of the person who ${what} (members.csv), empty when unknown`,
  ],
};
