import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { env } from '../env';
import { AppError, invalid, notFound, forbidden } from '../errors';
import {
  Machine,
  Membership,
  Organization,
  ServiceBooking,
  ServiceRecord,
  ServiceTask,
  User,
} from '../models';
import type { BookingItem } from '../models/service-booking';
import type { OrgAccess } from '../policies/access';
import { todayIso } from '../../shared/domain';
import type { BookingCreateInput, BookingStatus } from '../../shared/schemas/dealers';
import { recordAudit } from '../infra/audit';
import { requireCustomer } from './dealer-access';
import { queueMessage } from '../infra/mailer';
import { prefillLines } from './service-records';

const appUrl = () => env.APP_URL.replace(/\/+$/, '');

const audit = (
  access: OrgAccess,
  action: string,
  booking: ServiceBooking,
  changes: Record<string, unknown>,
  transaction?: Transaction,
) =>
  recordAudit(
    {
      organizationId: booking.organizationId,
      actorUserId: access.userId,
      action,
      entityType: 'service_booking',
      entityId: booking.id,
      changes: { dealerOrganizationId: booking.dealerOrganizationId, ...changes },
    },
    transaction,
  );

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
    await audit(access, 'booking.propose', row, { proposedFor: input.proposedFor }, transaction);
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
            `Accept or decline it here: ${appUrl()}/o/${farm.id}/bookings`,
          ].join('\n'),
        },
        transaction,
      );
    return row;
  });
}

/** Bookings of this organization: a dealer's proposals, or a farm's, soonest date first. */
export async function listBookings(
  access: OrgAccess,
  query: { status?: BookingStatus; customerId?: string },
) {
  const dealer = access.organization.kind === 'dealer';
  return ServiceBooking.findAll({
    where: {
      ...(dealer
        ? { dealerOrganizationId: access.organization.id }
        : { organizationId: access.organization.id }),
      ...(query.status && { status: query.status }),
      ...(dealer && query.customerId && { organizationId: query.customerId }),
    },
    order: [
      ['proposedFor', 'ASC'],
      ['createdAt', 'ASC'],
    ],
    limit: 500,
  });
}

/** A booking of this organization (either side), or 404. */
export async function loadBooking(access: OrgAccess, id: string, transaction?: Transaction) {
  const side =
    access.organization.kind === 'dealer'
      ? { dealerOrganizationId: access.organization.id }
      : { organizationId: access.organization.id };
  const booking = await ServiceBooking.findOne({
    where: { id, ...side },
    transaction,
    ...(transaction && { lock: transaction.LOCK.UPDATE }),
  });
  if (!booking) throw notFound('Booking');
  return booking;
}

const notProposed = (b: ServiceBooking) =>
  new AppError(409, 'not_proposed', `This booking is ${b.status} already`);

async function tellDealer(
  booking: ServiceBooking,
  farm: Organization,
  subject: string,
  text: string,
  transaction: Transaction,
) {
  const advisor = booking.proposedBy
    ? await User.findByPk(booking.proposedBy, { attributes: ['email', 'name'], transaction })
    : null;
  if (!advisor) return;
  await queueMessage(
    {
      organizationId: farm.id,
      recipient: advisor.email,
      kind: `booking_${booking.status}`,
      periodKey: booking.id,
      subject,
      text: [
        `Hello ${advisor.name},`,
        '',
        text,
        '',
        `${appUrl()}/o/${booking.dealerOrganizationId}/bookings`,
      ].join('\n'),
    },
    transaction,
  );
}

/**
 * The farm manager accepts: in one transaction each machine of the booking gets a planned
 * service record on the proposed date with its tasks (and their parts lists), so the visit shows
 * in the farm's shop week. Machines sold or tasks removed since the proposal are left out.
 */
export async function acceptBooking(access: OrgAccess, id: string, note: string) {
  const farm = access.organization;
  const booking = await sequelize.transaction(async (transaction) => {
    const b = await loadBooking(access, id, transaction);
    if (b.status !== 'proposed') throw notProposed(b);
    const today = todayIso(farm.timeZone);
    if (b.proposedFor < today)
      throw new AppError(
        409,
        'date_passed',
        `The proposed date ${b.proposedFor} has passed: decline it and ask for another`,
      );
    const dealer = await Organization.findByPk(b.dealerOrganizationId, { transaction });
    const machines = await Machine.findAll({
      where: { organizationId: farm.id, id: { [Op.in]: b.items.map((i) => i.machineId) } },
      transaction,
    });
    const tasks = await ServiceTask.findAll({
      where: {
        organizationId: farm.id,
        id: { [Op.in]: b.items.flatMap((i) => i.tasks.map((t) => t.taskId)) },
      },
      transaction,
    });
    const items: BookingItem[] = [];
    for (const item of b.items) {
      const machine = machines.find((m) => m.id === item.machineId && m.status !== 'sold');
      if (!machine) {
        items.push({ ...item, serviceRecordId: null });
        continue;
      }
      const own = item.tasks.flatMap((t) =>
        tasks.filter((x) => x.id === t.taskId && x.machineId === machine.id),
      );
      const lines = prefillLines(own);
      const record = await ServiceRecord.create(
        {
          organizationId: farm.id,
          machineId: machine.id,
          status: 'planned',
          plannedFor: b.proposedFor,
          performedOn: null,
          meterValue: null,
          meterLifetime: null,
          readingId: null,
          tasks: own.map((t) => ({ taskId: t.id, name: t.name })),
          technicianIds: [],
          labourHours: null,
          parts: lines.parts,
          fluids: lines.fluids,
          notes: [`Booked with ${dealer?.name ?? 'the dealer'}.`, b.note].filter(Boolean).join(' '),
          defectIds: [],
          createdBy: access.userId,
          completedBy: null,
          completedAt: null,
        },
        { transaction },
      );
      await recordAudit(
        {
          organizationId: farm.id,
          actorUserId: access.userId,
          action: 'service.plan',
          entityType: 'service_record',
          entityId: record.id,
          changes: { machineId: machine.id, plannedFor: b.proposedFor, bookingId: b.id },
        },
        transaction,
      );
      items.push({ ...item, serviceRecordId: record.id });
    }
    const recordIds = items.flatMap((i) => (i.serviceRecordId ? [i.serviceRecordId] : []));
    if (!recordIds.length)
      throw new AppError(
        409,
        'nothing_to_plan',
        'Every machine of this booking is sold or gone: decline it',
      );
    await b.update(
      {
        status: 'accepted',
        items,
        serviceRecordIds: recordIds,
        responseNote: note,
        decidedBy: access.userId,
        decidedAt: new Date(),
      },
      { transaction },
    );
    await audit(access, 'booking.accept', b, { serviceRecordIds: recordIds }, transaction);
    await tellDealer(
      b,
      farm,
      `${farm.name} accepted the service on ${b.proposedFor}`,
      `${farm.name} accepted your proposed service on ${b.proposedFor}.${note ? `\n\n${note}` : ''}`,
      transaction,
    );
    return b;
  });
  return booking;
}

export async function declineBooking(access: OrgAccess, id: string, note: string) {
  const farm = access.organization;
  const booking = await sequelize.transaction(async (transaction) => {
    const b = await loadBooking(access, id, transaction);
    if (b.status !== 'proposed') throw notProposed(b);
    await b.update(
      { status: 'declined', responseNote: note, decidedBy: access.userId, decidedAt: new Date() },
      { transaction },
    );
    await audit(access, 'booking.decline', b, {}, transaction);
    await tellDealer(
      b,
      farm,
      `${farm.name} declined the service on ${b.proposedFor}`,
      `${farm.name} declined your proposed service on ${b.proposedFor}.${note ? `\n\n${note}` : ''}`,
      transaction,
    );
    return b;
  });
  return booking;
}

/** The dealer withdraws a proposal the farm has not answered. */
export async function cancelBooking(access: OrgAccess, id: string) {
  return sequelize.transaction(async (transaction) => {
    const b = await loadBooking(access, id, transaction);
    if (b.status !== 'proposed') throw notProposed(b);
    await b.update(
      { status: 'cancelled', decidedBy: access.userId, decidedAt: new Date() },
      { transaction },
    );
    await audit(access, 'booking.cancel', b, {}, transaction);
    return b;
  });
}
