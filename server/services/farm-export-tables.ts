// What a farm's export holds: one CSV file per kind of record, each column named and explained
// once, so the archive's README.txt and its files cannot drift apart. Every query reads the
// organization's own rows only (`t.organization_id = :org`, joins on the same organization).
// The tables are in farm-export-{fleet,service,walkaround}-tables.ts, their shape in
// farm-export-columns.ts.
import type { ExportTable } from './farm-export-columns';
import { FLEET_TABLES } from './farm-export-fleet-tables';
import { SERVICE_TABLES } from './farm-export-service-tables';
import { WALKAROUND_TABLES } from './farm-export-walkaround-tables';

export { FILE_PATHS, type ExportColumn, type ExportTable } from './farm-export-columns';

/** Every table of the export, in the archive's order. */
export const EXPORT_TABLES: readonly ExportTable[] = [
  ...FLEET_TABLES,
  ...SERVICE_TABLES,
  ...WALKAROUND_TABLES,
];
