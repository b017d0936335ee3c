// The demo's dealer links and bookings: Quillon Equipment & Service has `service` access at
// Larkspur Flats and `view` access at Osier Creek, both accepted by the farm managers; one
// proposal waits for Larkspur's answer and one accepted booking is a planned visit at Osier Creek.
import type { Transaction } from 'sequelize';
import { DealerLink, ServiceBooking, ServiceRecord } from '../models';
import type { BookingItem } from '../models/service-booking';
import type { TaskFluid, TaskPart } from '../../shared/schemas/schedule';
import { addDaysIso, todayIso } from '../../shared/domain';
import { prefillLines } from '../services/service-records';

export interface DemoDealerContext {
  today: Date;
  orgId: (key: 'larkspur' | 'osier' | 'quillon') => string;
  userId: (email: string) => string;
  machineId: (m: { organization: string; fleetNumber: string }) => string;
  demoId: (name: string) => string;
  timeZoneOf: (key: 'larkspur' | 'osier') => string;
  machineName: (fleetNumber: string) => string;
  tasks: { id: string; machineId: string; name: string; parts: TaskPart[]; fluids: TaskFluid[] }[];
}

const ADVISOR = 'ravi@quillon.example';

function item(
  ctx: DemoDealerContext,
  farm: 'larkspur' | 'osier',
  fleetNumber: string,
  names: string[],
) {
  const machineId = ctx.machineId({ organization: farm, fleetNumber });
  const tasks = ctx.tasks.filter((t) => t.machineId === machineId && names.includes(t.name));
  return {
    item: {
      machineId,
      fleetNumber,
      machineName: ctx.machineName(fleetNumber),
      tasks: tasks.map((t) => ({ taskId: t.id, name: t.name })),
      serviceRecordId: null,
    } as BookingItem,
    tasks,
  };
}

export async function writeDealerLinks(ctx: DemoDealerContext, transaction: Transaction) {
  const quillon = ctx.orgId('quillon');
  const acceptedAt = new Date(ctx.today.getTime() - 200 * 86_400_000);
  const link = (farm: 'larkspur' | 'osier', access: 'view' | 'service', manager: string) => ({
    id: ctx.demoId(`dealer-link/quillon/${farm}`),
    dealerOrganizationId: quillon,
    farmOrganizationId: ctx.orgId(farm),
    access,
    status: 'active' as const,
    initiatedBy: 'dealer' as const,
    invitedBy: ctx.userId(ADVISOR),
    invitedEmail: manager,
    tokenHash: null,
    expiresAt: null,
    acceptedBy: ctx.userId(manager),
    acceptedAt,
    revokedBy: null,
    revokedAt: null,
  });
  await DealerLink.bulkCreate(
    [
      link('larkspur', 'service', 'marta@larkspur.example'),
      link('osier', 'view', 'aoife@osiercreek.example'),
    ],
    { transaction },
  );

  // Larkspur: a proposal for the sprayer's overdue fuel filters, waiting for Marta.
  const sprayer = item(ctx, 'larkspur', 'S-01', ['Fuel filters and water separator']);
  await ServiceBooking.create(
    {
      id: ctx.demoId('booking/larkspur/S-01'),
      organizationId: ctx.orgId('larkspur'),
      dealerOrganizationId: quillon,
      proposedBy: ctx.userId(ADVISOR),
      proposedFor: addDaysIso(todayIso(ctx.timeZoneOf('larkspur'), ctx.today), 5),
      items: [sprayer.item],
      note: 'Our field van is near you that day; filters in stock.',
      decidedBy: null,
      decidedAt: null,
    },
    { transaction },
  );

  // Osier Creek: accepted by Aoife, so the visit is a planned record in the farm's shop week.
  const tractor = item(ctx, 'osier', 'T-11', ['Hydraulic/transmission filters']);
  const plannedFor = addDaysIso(todayIso(ctx.timeZoneOf('osier'), ctx.today), 6);
  const recordId = ctx.demoId('booking-record/osier/T-11');
  const lines = prefillLines(tractor.tasks);
  await ServiceRecord.create(
    {
      id: recordId,
      organizationId: ctx.orgId('osier'),
      machineId: tractor.item.machineId,
      status: 'planned',
      plannedFor,
      performedOn: null,
      meterValue: null,
      meterLifetime: null,
      readingId: null,
      tasks: tractor.item.tasks,
      technicianIds: [],
      labourHours: null,
      parts: lines.parts,
      fluids: lines.fluids,
      notes: 'Booked with Quillon Equipment & Service. Hydraulic filters at our shop.',
      createdBy: ctx.userId('aoife@osiercreek.example'),
      completedBy: null,
      completedAt: null,
    },
    { transaction },
  );
  await ServiceBooking.create(
    {
      id: ctx.demoId('booking/osier/T-11'),
      organizationId: ctx.orgId('osier'),
      dealerOrganizationId: quillon,
      proposedBy: ctx.userId(ADVISOR),
      proposedFor: plannedFor,
      items: [{ ...tractor.item, serviceRecordId: recordId }],
      note: 'Hydraulic filters at our shop.',
      status: 'accepted',
      responseNote: 'Fine, we will bring it over.',
      decidedBy: ctx.userId('aoife@osiercreek.example'),
      decidedAt: new Date(ctx.today.getTime() - 86_400_000),
      serviceRecordIds: [recordId],
    },
    { transaction },
  );
}
