import { useState } from 'react';
import { BOOKING_STATUS_LABELS, type BookingStatus } from '../../../../shared/schemas/dealers';
import { Alert } from '../../../components/ui/alert';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import type { IconName } from '../../../components/ui/icons';
import { TextareaField } from '../../../components/ui/textarea-field';
import { useDecideBooking, type BookingAction } from '../api/decide-booking';
import type { Booking } from '../api/types';
import { dateText } from './dealer-format';

const STATUS: Record<BookingStatus, { tone: BadgeTone; icon: IconName }> = {
  proposed: { tone: 'due-soon', icon: 'clock' },
  accepted: { tone: 'ok', icon: 'check' },
  declined: { tone: 'neutral', icon: 'close' },
  cancelled: { tone: 'neutral', icon: 'close' },
};

export function BookingStatusBadge({ status }: { status: BookingStatus }) {
  return (
    <Badge tone={STATUS[status].tone} icon={STATUS[status].icon}>
      {BOOKING_STATUS_LABELS[status]}
    </Badge>
  );
}

/** Bookings on either side: the farm accepts or declines, the dealer withdraws. */
export function BookingList({
  orgId,
  bookings,
  side,
  emptyText,
}: {
  orgId: string;
  bookings: Booking[];
  side: 'farm' | 'dealer';
  emptyText: string;
}) {
  if (bookings.length === 0)
    return (
      <EmptyState icon="clock" title="No bookings">
        <p>{emptyText}</p>
      </EmptyState>
    );
  return (
    <ul aria-label="Bookings" className="flex flex-col gap-3">
      {bookings.map((b) => (
        <BookingCard key={b.id} orgId={orgId} booking={b} side={side} />
      ))}
    </ul>
  );
}

function BookingCard({
  orgId,
  booking: b,
  side,
}: {
  orgId: string;
  booking: Booking;
  side: 'farm' | 'dealer';
}) {
  const decide = useDecideBooking(orgId);
  const [note, setNote] = useState('');
  const act = (action: BookingAction) => decide.mutate({ bookingId: b.id, action, note });
  const other = side === 'farm' ? b.dealer.name : b.customer.name;
  const overlaps = b.items.filter((i) => i.plannedVisits.length);
  return (
    <li className="flex flex-col gap-3 rounded-xl border border-field-200 bg-white p-4 shadow-card">
      <div className="flex flex-wrap items-center gap-2">
        <BookingStatusBadge status={b.status} />
        <p className="font-bold">
          {dateText(b.proposedFor)} · {other}
        </p>
      </div>
      <ul className="list-disc pl-5 text-field-800">
        {b.items.map((i) => (
          <li key={i.machine.id}>
            {i.machine.fleetNumber} {i.machine.name}
            {i.tasks.length ? `: ${i.tasks.map((t) => t.name).join(', ')}` : ''}
          </li>
        ))}
      </ul>
      {b.note ? (
        <p className="text-field-700">
          <span className="font-bold">{b.proposedBy?.name ?? b.dealer.name}:</span> {b.note}
        </p>
      ) : null}
      {b.responseNote ? (
        <p className="text-field-700">
          <span className="font-bold">{b.decidedBy?.name ?? b.customer.name}:</span>{' '}
          {b.responseNote}
        </p>
      ) : null}
      {b.status === 'accepted' && side === 'farm' ? (
        <p className="text-sm text-field-700">
          Planned in your shop week for {dateText(b.proposedFor)}.
        </p>
      ) : null}
      {decide.isError ? <Alert>{decide.error.message}</Alert> : null}
      {b.abilities.accept && overlaps.length ? (
        <Alert tone="warning" title="Overlaps a planned visit">
          <p>Accepting plans this work a second time in your shop week:</p>
          <ul className="mt-1 list-disc pl-5">
            {overlaps.flatMap((i) =>
              i.plannedVisits.map((v) => (
                <li key={`${i.machine.id}|${v.id}`}>
                  {i.machine.fleetNumber} is planned for {dateText(v.plannedFor)}
                  {v.tasks.length ? `: ${v.tasks.map((t) => t.name).join(', ')}` : ''}
                </li>
              )),
            )}
          </ul>
          <p className="mt-1">Decline and tell {b.dealer.name} why, or cancel that plan first.</p>
        </Alert>
      ) : null}
      {b.abilities.accept || b.abilities.decline ? (
        <div className="flex flex-col gap-3">
          <TextareaField
            label={`Note to ${b.dealer.name}`}
            hint="Optional."
            rows={2}
            value={note}
            maxLength={1000}
            onChange={(e) => setNote(e.target.value)}
          />
          <div className="flex flex-wrap gap-2">
            <Button
              icon="check"
              pending={decide.isPending && decide.variables?.action === 'accept'}
              onClick={() => act('accept')}
            >
              {overlaps.length ? 'Accept anyway' : 'Accept booking'}
            </Button>
            <Button
              variant="secondary"
              icon="close"
              disabled={decide.isPending}
              onClick={() => act('decline')}
            >
              Decline
            </Button>
          </div>
        </div>
      ) : null}
      {b.abilities.cancel ? (
        <div>
          <Button
            variant="ghost"
            icon="close"
            pending={decide.isPending}
            onClick={() => act('cancel')}
          >
            Withdraw proposal
          </Button>
        </div>
      ) : null}
    </li>
  );
}
