// The rows the PATCH round-trip test (patch-roundtrip.test.ts) compares, and the PATCH routes the
// OpenAPI document lists: each route's stored row and its child rows, as JSON text.
import { QueryTypes } from 'sequelize';
import { buildOpenApiDocument } from '../../server/openapi';
import { sequelize } from '../../server/db';
import type { PopulatedWorld } from '../support/populated-world';

type Ids = PopulatedWorld['ids'];
export interface FieldCase {
  /** the one field sent */
  field: string;
  value: (ids: Ids) => unknown;
  /** the row's columns this field is stored in (default: the field in snake_case) */
  columns?: string[];
  /** child tables this field is stored in instead (their rows for the record may change) */
  children?: string[];
  /**
   * a PATCH sent first, before the snapshot, when the field can only change from a state the
   * row is not in yet (a season days field needs a season)
   */
  setup?: (ids: Ids) => Record<string, unknown>;
}
export interface PatchRoute {
  table: string;
  /** the column the row is keyed by, when not `id` */
  idColumn?: string;
  /** the row's id */
  id: (w: PopulatedWorld) => string;
  url: (w: PopulatedWorld) => string;
  /** child tables holding parts of the record: (table, column naming the record) */
  children?: [string, string][];
  cases: FieldCase[];
}

/** Every column of one stored row, as JSON text (dates as ISO, numerics as PostgreSQL prints them). */
async function storedRow(
  table: string,
  id: string,
  idColumn = 'id',
): Promise<Record<string, string>> {
  const [row] = await sequelize.query<Record<string, unknown>>(
    `SELECT * FROM "${table}" WHERE "${idColumn}" = :id`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  if (!row) throw new Error(`no ${table} row ${id}`);
  return Object.fromEntries(Object.entries(row).map(([k, val]) => [k, JSON.stringify(val)]));
}

async function childRows(table: string, column: string, id: string) {
  const rows = await sequelize.query<Record<string, unknown>>(
    `SELECT * FROM "${table}" WHERE "${column}" = :id ORDER BY 1`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  return JSON.stringify(rows);
}

export const without = (row: Record<string, string>, columns: string[]) =>
  Object.fromEntries(Object.entries(row).filter(([k]) => !columns.includes(k)));

export async function snapshot(route: PatchRoute, w: PopulatedWorld) {
  const row = await storedRow(route.table, route.id(w), route.idColumn);
  const children: Record<string, string> = {};
  for (const [table, column] of route.children ?? [])
    children[table] = await childRows(table, column, route.id(w));
  return { row, children };
}

export const patchPaths = () => {
  const doc = buildOpenApiDocument() as unknown as {
    paths: Record<string, Record<string, { requestBody?: { content: Record<string, unknown> } }>>;
  };
  return Object.entries(doc.paths)
    .filter(([, ops]) => ops.patch)
    .map(([path, ops]) => {
      const body = ops.patch.requestBody?.content['application/json'] as
        { schema: { properties?: Record<string, unknown> } } | undefined;
      return { path, fields: Object.keys(body?.schema.properties ?? {}) };
    });
};
