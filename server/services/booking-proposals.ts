import { Op } from 'sequelize';
import { sequelize } from '../db';
import { invalid, forbidden } from '../errors';
import {
  Machine,
  Membership,
  type Organization,
  ServiceBooking,
  ServiceTask,
  User,
} from '../models';
import type { BookingItem } from '../models/service-booking';
import type { OrgAccess } from '../policies/access';
import { todayIso } from '../../shared/domain';
import type { BookingCreateInput } from '../../shared/schemas/dealers';
import { queueMessage } from '../infra/mailer';
import { requireCustomer } from './dealer-access';
import { auditBooking, bookingsUrl } from './bookings';

/** The items of a proposal, checked against the farm's machines and schedules (422 by field). */
async function resolveItems(farm: Organization, input: BookingCreateInput['items']) {
  const machines = await Machine.findAll({
    where: { organizationId: farm.id, id: { [Op.in]: input.map((i) => i.machineId) } },
  });
  const tasks = await ServiceTask.findAll({
    where: {
      organizationId: farm.id,
      machineId: { [Op.in]: input.map((i) => i.machineId) },
    },
    attributes: ['id', 'machineId', 'name'],
  });
  const errors: Record<string, string> = {};
  const seen = new Set<string>();
  const items: BookingItem[] = input.map((item, i) => {
    const machine = machines.find((m) => m.id === item.machineId);
    if (!machine) errors[`items.${i}.machineId`] = `No such machine at ${farm.name}`;
    else if (machine.status === 'sold')
      errors[`items.${i}.machineId`] = `${machine.fleetNumber} is sold`;
    else if (seen.has(machine.id))
      errors[`items.${i}.machineId`] = `${machine.fleetNumber} is listed twice`;
    seen.add(item.machineId);
    const own = tasks.filter((t) => t.machineId === item.machineId);
    const chosen = [...new Set(item.taskIds)].map((id, j) => {
      const task = own.find((t) => t.id === id);
      if (!task && machine)
        errors[`items.${i}.taskIds.${j}`] = `No such task on ${machine.fleetNumber}'s schedule`;
      return { taskId: id, name: task?.name ?? '' };
    });
    return {
      machineId: item.machineId,
      fleetNumber: machine?.fleetNumber ?? '',
      machineName: machine?.name ?? '',
      tasks: chosen,
      serviceRecordId: null,
    };
  });
  if (Object.keys(errors).length) throw invalid(errors);
  return items;
}

/** The farm's managers' addresses, for notices about bookings. */
async function managerEmails(farmId: string) {
  const rows = await Membership.findAll({
    where: { organizationId: farmId, role: 'manager' },
    include: [{ model: User, as: 'user', attributes: ['email', 'name'] }],
  });
  return rows.flatMap((m) => (m.user ? [{ email: m.user.email, name: m.user.name }] : []));
}

/** A dealer proposes a service date for machines (and tasks) of a linked customer. */
export async function proposeBooking(access: OrgAccess, input: BookingCreateInput) {
  const link = await requireCustomer(access.organization.id, input.customerId);
  const farm = link.farm!;
  // a view link reads the farm's due list and writes nothing to it, proposals included
  if (link.access !== 'service')
    throw forbidden(
      `${farm.name} gave your dealership view access only: ask them for service access to propose a service date`,
    );
  const today = todayIso(farm.timeZone);
  if (input.proposedFor < today)
    throw invalid({ proposedFor: `The date may not be before today (${today} at ${farm.name})` });
  const items = await resolveItems(farm, input.items);
  const managers = await managerEmails(farm.id);
  return sequelize.transaction(async (transaction) => {
    const row = await ServiceBooking.create(
      {
        organizationId: farm.id,
        dealerOrganizationId: access.organization.id,
        proposedBy: access.userId,
        proposedFor: input.proposedFor,
        items,
        note: input.note,
        decidedBy: null,
        decidedAt: null,
      },
      { transaction },
    );
    await auditBooking(
      access,
      'booking.propose',
      row,
      { proposedFor: input.proposedFor },
      transaction,
    );
    const machines = items.map((i) => `${i.fleetNumber} ${i.machineName}`).join(', ');
    for (const manager of managers)
      await queueMessage(
        {
          organizationId: access.organization.id,
          recipient: manager.email,
          kind: 'booking_proposed',
          periodKey: row.id,
          subject: `${access.organization.name} proposes a service on ${input.proposedFor}`,
          text: [
            `Hello ${manager.name},`,
            '',
            `${access.organization.name} proposes to service ${machines} on ${input.proposedFor}.`,
            ...(input.note ? ['', input.note] : []),
            '',
            `Accept or decline it here: ${bookingsUrl(farm.id)}`,
          ].join('\n'),
        },
        transaction,
      );
    return row;
  });
}
