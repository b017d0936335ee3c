import { QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import type { OrgAccess } from '../policies/access';
import type { FirstRunChecklist, FirstRunStep } from '../../shared/schemas/onboarding';
import { ensureDuePointsCurrent } from './forecast';

/** The digest hour a farm starts with; another hour (or a recorded choice) means it was chosen. */
const DEFAULT_DIGEST_HOUR = 6;

interface Counts {
  machines: number;
  without_schedule: number;
  first_without_schedule: string | null;
  history_unknown: number;
  first_history_unknown: string | null;
  members: number;
  invitations: number;
  dealers: number;
  digest_hour: number;
  digest_chosen: boolean;
  service_records: number;
  dismissed: boolean;
}

const COUNTS_SQL = `
  WITH fleet AS (
    SELECT id, fleet_number FROM machines WHERE organization_id = :org AND status <> 'sold'
  ), bare AS (
    SELECT f.id, f.fleet_number FROM fleet f WHERE NOT EXISTS (
      SELECT 1 FROM service_tasks t WHERE t.organization_id = :org AND t.machine_id = f.id)
  ), unknown AS (
    SELECT d.machine_id, f.fleet_number FROM task_due_points d JOIN fleet f ON f.id = d.machine_id
    WHERE d.organization_id = :org AND d.status = 'history_unknown'
  )
  SELECT
    (SELECT count(*)::int FROM fleet) AS machines,
    (SELECT count(*)::int FROM bare) AS without_schedule,
    (SELECT id FROM bare ORDER BY lower(fleet_number) LIMIT 1) AS first_without_schedule,
    (SELECT count(*)::int FROM unknown) AS history_unknown,
    (SELECT machine_id FROM unknown ORDER BY lower(fleet_number) LIMIT 1) AS first_history_unknown,
    (SELECT count(*)::int FROM memberships WHERE organization_id = :org) AS members,
    (SELECT count(*)::int FROM invitations
      WHERE organization_id = :org AND accepted_at IS NULL AND expires_at > now()) AS invitations,
    (SELECT count(*)::int FROM dealer_links
      WHERE farm_organization_id = :org AND status IN ('active', 'pending')) AS dealers,
    (SELECT digest_hour FROM organizations WHERE id = :org) AS digest_hour,
    EXISTS (SELECT 1 FROM audit_events
      WHERE organization_id = :org AND action = 'organization.digest_hour') AS digest_chosen,
    (SELECT count(*)::int FROM service_records
      WHERE organization_id = :org AND status = 'completed') AS service_records,
    EXISTS (SELECT 1 FROM first_run_dismissals
      WHERE organization_id = :org AND user_id = :user) AS dismissed`;

/** The first-run checklist of a farm as this manager sees it, ticked from the farm's data. */
export async function firstRunChecklist(access: OrgAccess): Promise<FirstRunChecklist> {
  const { organization } = access;
  await ensureDuePointsCurrent(organization.id, organization.timeZone);
  const [c] = await sequelize.query<Counts>(COUNTS_SQL, {
    replacements: { org: organization.id, user: access.userId },
    type: QueryTypes.SELECT,
  });
  const step = (
    key: FirstRunStep,
    done: boolean,
    remaining: number | null = null,
    machineId: string | null = null,
  ) => ({ key, done, remaining, machineId });
  const steps = [
    step('machines', c.machines > 0),
    step(
      'schedules',
      c.machines > 0 && c.without_schedule === 0,
      c.machines > 0 ? c.without_schedule : null,
      c.first_without_schedule,
    ),
    step(
      'lastDone',
      c.machines > 0 && c.without_schedule < c.machines && c.history_unknown === 0,
      c.history_unknown,
      c.first_history_unknown,
    ),
    step('team', c.members > 1 || c.invitations > 0),
    step('dealer', c.dealers > 0),
    step('digestHour', c.digest_chosen || c.digest_hour !== DEFAULT_DIGEST_HOUR),
  ];
  const complete = steps.every((s) => s.done);
  return {
    steps,
    complete,
    dismissed: c.dismissed,
    offered: !complete && !c.dismissed && c.service_records === 0,
  };
}

/** Puts the checklist away for this person on this farm (or brings it back). */
export async function setFirstRunDismissed(access: OrgAccess, dismissed: boolean) {
  const replacements = { org: access.organization.id, user: access.userId };
  await sequelize.query(
    dismissed
      ? `INSERT INTO first_run_dismissals (organization_id, user_id) VALUES (:org, :user)
         ON CONFLICT DO NOTHING`
      : 'DELETE FROM first_run_dismissals WHERE organization_id = :org AND user_id = :user',
    { replacements },
  );
}
