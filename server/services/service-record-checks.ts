import { Op, type Transaction } from 'sequelize';
import { TZDate } from '@date-fns/tz';
import { AppError, invalid } from '../errors';
import { Defect, Membership, ServiceTask, type Machine } from '../models';
import type { ReassemblySetting } from '../../shared/schemas/service-records';
import { localDayNumber, isoFromDayNumber, todayIso } from '../../shared/domain';
import type { OrgAccess } from '../policies/access';
import { canHandleDefects } from '../policies/defect';
import { DEALER_DEFECTS_REFUSAL } from './defects';

// The checks a service record's input passes before anything is written: its tasks, technicians
// and defects belong to this farm and machine, its date and meter time fit, its settings are ticked.

/** The machine's tasks with these ids, in the order given; unknown ids named `taskIds.i`. */
export async function resolveTasks(
  access: OrgAccess,
  machine: Machine,
  taskIds: string[],
  transaction?: Transaction,
) {
  if (!taskIds.length) return [];
  const rows = await ServiceTask.findAll({
    where: {
      organizationId: access.organization.id,
      machineId: machine.id,
      id: { [Op.in]: taskIds },
    },
    transaction,
  });
  const byId = new Map(rows.map((t) => [t.id, t]));
  const errors: Record<string, string> = {};
  taskIds.forEach((id, i) => {
    if (!byId.has(id)) errors[`taskIds.${i}`] = `No such task on ${machine.fleetNumber}'s schedule`;
  });
  if (Object.keys(errors).length) throw invalid(errors);
  return [...new Set(taskIds)].map((id) => byId.get(id)!);
}

/** Technicians named must be members of this farm (else 422 on `technicianIds.i`). */
export async function checkTechnicians(access: OrgAccess, ids: string[]) {
  if (!ids.length) return;
  const members = await Membership.findAll({
    where: { organizationId: access.organization.id, userId: { [Op.in]: ids } },
    attributes: ['userId'],
  });
  const known = new Set(members.map((m) => m.userId));
  const errors: Record<string, string> = {};
  ids.forEach((id, i) => {
    if (!known.has(id)) errors[`technicianIds.${i}`] = 'Not a member of this farm';
  });
  if (Object.keys(errors).length) throw invalid(errors);
}

/**
 * A dealer's `service` link records services but never closes (nor books the closing of) a farm's
 * defects: any defect id from a dealer is refused before it is looked up, and the refusal names none.
 */
export function refuseDealerDefects(access: OrgAccess, ids: string[] | undefined) {
  if (ids?.length && !canHandleDefects(access))
    throw new AppError(403, 'forbidden', DEALER_DEFECTS_REFUSAL, {
      closesDefectIds: DEALER_DEFECTS_REFUSAL,
    });
}

/** Defects a plan is to fix: each active on this machine. */
export async function checkDefectsActive(access: OrgAccess, machine: Machine, ids: string[]) {
  if (!ids.length) return;
  const rows = await Defect.findAll({
    where: { organizationId: access.organization.id, id: { [Op.in]: ids } },
  });
  const byId = new Map(rows.map((d) => [d.id, d]));
  const errors: Record<string, string> = {};
  ids.forEach((id, i) => {
    const d = byId.get(id);
    if (!d || d.machineId !== machine.id)
      errors[`closesDefectIds.${i}`] = `No such defect on ${machine.fleetNumber}`;
    else if (d.status === 'fixed')
      errors[`closesDefectIds.${i}`] = `"${d.title}" is closed already`;
  });
  if (Object.keys(errors).length) throw invalid(errors);
}

/**
 * A record may not be completed while a reassembly setting is unticked, unless the technician
 * says why. Each unticked setting is named by `reassemblySettings.i.restored`.
 */
export function checkReassembly(settings: ReassemblySetting[], reason: string) {
  const unticked = settings.map((s, i) => ({ s, i })).filter(({ s }) => !s.restored);
  if (!unticked.length || reason.trim()) return;
  const fields: Record<string, string> = {};
  for (const { s, i } of unticked)
    fields[`reassemblySettings.${i}.restored`] =
      `"${s.what}: ${s.value}" is not ticked as restored: restore it, or say why it stays as it is under "Reason a setting is not restored"`;
  const names = unticked.map(({ s }) => `"${s.what}: ${s.value}"`).join(', ');
  throw invalid(
    fields,
    `Not completed: reassembly setting ${names} ${unticked.length === 1 ? 'is' : 'are'} not ticked as restored. Tick ${unticked.length === 1 ? 'it' : 'them'} once restored, or say why under "Reason a setting is not restored".`,
  );
}

/** A service is not recorded after the farm's local today. */
export function checkPerformedOn(access: OrgAccess, performedOn: string) {
  const today = todayIso(access.organization.timeZone);
  if (performedOn > today)
    throw invalid({ performedOn: `The date may not be after today (${today})` });
}

/** When the service's meter value was read: as given, now when done today, else midday local time. */
export function meterTime(access: OrgAccess, performedOn: string, meterReadAt?: string): Date {
  const tz = access.organization.timeZone;
  if (meterReadAt) {
    const at = new Date(meterReadAt);
    if (isoFromDayNumber(localDayNumber(at, tz)) !== performedOn)
      throw invalid({ meterReadAt: `Must fall on the performed date (${performedOn}, ${tz})` });
    return at;
  }
  if (performedOn === todayIso(tz)) return new Date();
  const [y, m, d] = performedOn.split('-').map(Number);
  return new Date(new TZDate(y, m - 1, d, 12, 0, 0, tz).getTime());
}
