import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../db';
import { AppError } from '../errors';
import { Machine, Organization, ServiceBooking, ServiceRecord, ServiceTask, User } from '../models';
import type { BookingItem } from '../models/service-booking';
import type { OrgAccess } from '../policies/access';
import { todayIso } from '../../shared/domain';
import { recordAudit } from '../infra/audit';
import { queueMessage } from '../infra/mailer';
import { prefillLines } from './service-records';
import { auditBooking, bookingsUrl, loadBooking } from './bookings';

// The answers to a proposal: the farm accepts (planned service records) or declines; the dealer withdraws.

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
        bookingsUrl(booking.dealerOrganizationId),
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
    await auditBooking(access, 'booking.accept', b, { serviceRecordIds: recordIds }, transaction);
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
    await auditBooking(access, 'booking.decline', b, {}, transaction);
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
    await auditBooking(access, 'booking.cancel', b, {}, transaction);
    return b;
  });
}
