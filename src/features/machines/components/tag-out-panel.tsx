import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ReturnToServiceForm } from '../../../components/ui/return-to-service-form';
import { formatDateTime } from '../../../lib/format';
import { useReturnToService } from '../api/return-to-service';
import type { MachineAbilities, MachineDetail } from '../api/types';

const plural = (n: number) => (n === 1 ? '1 critical defect is' : `${n} critical defects are`);

/**
 * A tagged-out machine: do not use it, since when and why, and for the farm's technicians and
 * managers the separate step that returns it to service once its critical defects are closed.
 */
export function TagOutPanel({
  orgId,
  machine,
  abilities,
  timeZone,
  defectsHref,
}: {
  orgId: string;
  machine: MachineDetail['data'];
  abilities: Pick<MachineAbilities, 'returnToService'>;
  timeZone: string;
  /** the machine's defects (farm members) */
  defectsHref?: string;
}) {
  const [open, setOpen] = useState(false);
  const [done, setDone] = useState(false);
  const release = useReturnToService(orgId, machine.id);
  if (done && machine.status === 'in_service')
    return (
      <Alert tone="success" title={`${machine.fleetNumber} is back in service`}>
        Your note of what was checked is kept with its history.
      </Alert>
    );
  if (machine.status !== 'tagged_out') return null;
  const tagOut = machine.tagOut;
  const openCritical = tagOut?.openCriticalDefects ?? null;

  return (
    <section
      aria-label={`${machine.fleetNumber} is tagged out`}
      className="flex flex-col gap-3 rounded-xl border-2 border-poppy-300 bg-poppy-50 p-4"
    >
      <Alert tone="error" title="Tagged out — do not use">
        <p>
          Do not start or operate {machine.fleetNumber}. It stays tagged out until a technician or
          manager has checked the repair and returns it to service.
        </p>
        {tagOut?.since || tagOut?.reason ? (
          <p className="mt-1">
            {tagOut.since ? `Tagged out ${formatDateTime(tagOut.since, timeZone)}. ` : ''}
            {tagOut.reason ? `Why: ${tagOut.reason}` : ''}
          </p>
        ) : null}
      </Alert>
      {openCritical !== null && openCritical > 0 ? (
        <p className="font-bold text-poppy-900">
          {plural(openCritical)} still open: close {openCritical === 1 ? 'it' : 'them'} before
          returning {machine.fleetNumber} to service.{' '}
          {defectsHref ? (
            <Link to={defectsHref} className="underline">
              Its defects
            </Link>
          ) : null}
        </p>
      ) : null}
      {abilities.returnToService && openCritical === 0 ? (
        open ? (
          <div className="rounded-lg bg-white p-3">
            <ReturnToServiceForm
              fleetNumber={machine.fleetNumber}
              onSubmit={async (note) => {
                await release.mutateAsync(note);
                setDone(true);
              }}
              onCancel={() => setOpen(false)}
            />
          </div>
        ) : (
          <div className="flex flex-col gap-2 sm:flex-row sm:items-center">
            <p className="text-poppy-900">
              No critical defect is open. When the machine has been checked, return it to service
              with a note of what was checked.
            </p>
            <Button
              variant="secondary"
              className="min-h-12 shrink-0"
              aria-expanded={open}
              onClick={() => setOpen(true)}
            >
              Return to service…
            </Button>
          </div>
        )
      ) : null}
    </section>
  );
}
