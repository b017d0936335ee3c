// Loading one machine scoped to the caller: every request that names a machine starts here, so
// it is one statement straight to pg (db-direct.ts) — the machine row with its assigned
// operators, locked FOR UPDATE when asked — built into a Machine as Sequelize would build it.
import type { Transaction } from 'sequelize';
import { directQuery } from '../db-direct';
import { notFound } from '../errors';
import { Machine } from '../models';
import type { OrgAccess } from '../policies/access';
import { canViewMachine } from '../policies/machine';

let columns: string | undefined;
/** The select list of every Machine attribute, aliased to its name (as findOne selects). */
const machineColumns = () =>
  (columns ??= Object.entries(Machine.getAttributes())
    .map(([name, attribute]) => `m."${attribute.field ?? name}" AS "${name}"`)
    .join(', '));

/**
 * The machine if it belongs to the caller's organization and the caller may see it; else 404.
 * With `lock` (inside a transaction), FOR UPDATE takes the row lock every reading writer takes
 * (reading-neighbours.ts lockMachineReadings).
 */
export async function loadMachine(
  access: OrgAccess,
  machineId: string,
  transaction?: Transaction,
  options: { lock?: boolean } = {},
) {
  const [row] = await directQuery<Record<string, unknown> & { operatorIds: string[] }>(
    transaction,
    `SELECT ${machineColumns()},
       (SELECT coalesce(array_agg(o.user_id::text), '{}') FROM machine_operators o
        WHERE o.machine_id = m.id AND o.organization_id = m.organization_id) AS "operatorIds"
     FROM machines m WHERE m.id = $1 AND m.organization_id = $2
     ${options.lock && transaction ? 'FOR UPDATE OF m' : ''}`,
    [machineId, access.organization.id],
  );
  if (!row) throw notFound('Machine');
  const { operatorIds, ...attributes } = row;
  const machine = Machine.build(attributes as never, { isNewRecord: false, raw: true });
  if (!canViewMachine(access, machine, operatorIds)) throw notFound('Machine');
  return { machine, operatorIds };
}
