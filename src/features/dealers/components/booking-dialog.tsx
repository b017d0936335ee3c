import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { bookingCreateSchema } from '../../../../shared/schemas/dealers';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { TextareaField } from '../../../components/ui/textarea-field';
import { todayInZone } from '../../../lib/fleet-format';
import { applyServerErrors } from '../../../lib/form-errors';
import { useProposeBooking } from '../api/propose-booking';
import type { Booking, BoardRow } from '../api/types';
import { FormDialog } from './form-dialog';
import { dateText } from './dealer-format';

interface BookingDialogProps {
  orgId: string;
  timeZone: string;
  customer: { id: string; name: string };
  rows: BoardRow[];
  onClose: () => void;
}

/** The selected services grouped by machine, as a booking's items. */
function itemsOf(rows: BoardRow[]) {
  const byMachine = new Map<string, { machine: BoardRow['machine']; tasks: BoardRow[] }>();
  for (const r of rows) {
    const entry = byMachine.get(r.machine.id) ?? { machine: r.machine, tasks: [] };
    entry.tasks.push(r);
    byMachine.set(r.machine.id, entry);
  }
  return [...byMachine.values()];
}

/** "Propose booking": a date and a note for the selected machines and tasks of one customer. */
export function BookingDialog({ orgId, timeZone, customer, rows, onClose }: BookingDialogProps) {
  const propose = useProposeBooking(orgId);
  const groups = itemsOf(rows);
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState<Booking | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(bookingCreateSchema),
    defaultValues: {
      customerId: customer.id,
      proposedFor: '',
      note: '',
      items: groups.map((g) => ({
        machineId: g.machine.id,
        taskIds: g.tasks.map((t) => t.taskId),
      })),
    },
  });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      setDone(await propose.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['proposedFor', 'note']));
    }
  });

  return (
    <FormDialog open title={`Propose a booking to ${customer.name}`} onClose={onClose}>
      {done ? (
        <>
          <Alert tone="success">
            Proposed for {dateText(done.proposedFor)}. {customer.name}&apos;s manager is told by
            e-mail and accepts or declines it; the Bookings page shows the answer.
          </Alert>
          <Button onClick={onClose}>Done</Button>
        </>
      ) : (
        <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
          {formError ? <Alert>{formError}</Alert> : null}
          <div>
            <p className="font-bold">Machines and services</p>
            <ul className="mt-1 list-disc pl-5 text-field-800">
              {groups.map((g) => (
                <li key={g.machine.id}>
                  {g.machine.fleetNumber} {g.machine.name}:{' '}
                  {g.tasks.map((t) => t.taskName).join(', ')}
                </li>
              ))}
            </ul>
          </div>
          <TextField
            label="Proposed date"
            type="date"
            min={todayInZone(timeZone)}
            hint="The farm's own date; it may not be in the past."
            error={errors.proposedFor?.message}
            {...register('proposedFor')}
          />
          <TextareaField
            label="Note to the farm"
            hint="Optional: where the work is done, how long it takes, what to have ready."
            error={errors.note?.message}
            {...register('note')}
          />
          <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
            <Button variant="secondary" onClick={onClose}>
              Cancel
            </Button>
            <Button type="submit" icon="clock" pending={isSubmitting}>
              Propose booking
            </Button>
          </div>
        </form>
      )}
    </FormDialog>
  );
}
