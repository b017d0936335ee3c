import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { clearTagOutSchema } from '../../../../shared/schemas/defects';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { TextareaField } from '../../../components/ui/textarea-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useClearTagOut } from '../api/clear-tag-out';
import type { MachineOption } from '../api/types';

/**
 * The machines tagged out right now: nobody may use them. The shop can return one to service
 * with a note once no critical defect is open (the server answers 409 and says so otherwise).
 */
export function TaggedOutMachines({
  orgId,
  machines,
  canClear,
}: {
  orgId: string;
  machines: MachineOption[];
  canClear: boolean;
}) {
  if (machines.length === 0) return null;
  return (
    <section
      aria-labelledby="tagged-out-heading"
      className="flex flex-col gap-3 rounded-xl border-2 border-poppy-300 bg-poppy-50 p-4"
    >
      <h2 id="tagged-out-heading" className="text-lg font-black text-poppy-900">
        Tagged out — do not use
      </h2>
      <ul className="flex flex-col gap-3">
        {machines.map((machine) => (
          <li key={machine.id}>
            <TaggedOutRow orgId={orgId} machine={machine} canClear={canClear} />
          </li>
        ))}
      </ul>
    </section>
  );
}

function TaggedOutRow({
  orgId,
  machine,
  canClear,
}: {
  orgId: string;
  machine: MachineOption;
  canClear: boolean;
}) {
  const [open, setOpen] = useState(false);
  return (
    <div className="flex flex-col gap-2 rounded-lg bg-white p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <span className="flex flex-wrap items-center gap-2">
          <span className="font-black">{machine.fleetNumber}</span>
          <span className="text-field-700">{machine.name}</span>
          <Badge tone="overdue" icon="lock">
            Tagged out
          </Badge>
        </span>
        {canClear ? (
          <Button
            variant="secondary"
            className="min-h-12"
            aria-expanded={open}
            onClick={() => setOpen((was) => !was)}
          >
            Clear tag-out<span className="sr-only"> of {machine.fleetNumber}</span>
          </Button>
        ) : null}
      </div>
      {open ? (
        <ClearTagOutForm orgId={orgId} machine={machine} onDone={() => setOpen(false)} />
      ) : null}
    </div>
  );
}

function ClearTagOutForm({
  orgId,
  machine,
  onDone,
}: {
  orgId: string;
  machine: MachineOption;
  onDone: () => void;
}) {
  const clear = useClearTagOut(orgId);
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: zodResolver(clearTagOutSchema), defaultValues: { note: '' } });

  const onSubmit = handleSubmit(async ({ note }) => {
    setFormError(null);
    try {
      await clear.mutateAsync({ machineId: machine.id, note });
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['note']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
      {formError ? <Alert>{formError}</Alert> : null}
      <TextareaField
        label="What was checked before returning it to service"
        hint="Required. Close its critical defects first; check it as the operator's manual and qualified service practice say."
        error={errors.note?.message}
        {...register('note')}
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={isSubmitting} className="min-h-12">
          Return {machine.fleetNumber} to service
        </Button>
        <Button variant="ghost" className="min-h-12" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
