import { useEffect, useRef } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ReturnToServiceForm } from '../../../components/ui/return-to-service-form';
import { useReturnToService } from '../api/return-to-service';
import type { ClosedDefect } from '../api/types';

/**
 * After a defect is closed: what happened to the machine, in plain words. A tagged-out machine
 * stays tagged out; once no critical defect is open the shop may return it to service here.
 */
export function ClosedDefectNotice({
  orgId,
  closed,
  canReturn,
  onReturned,
  onDismiss,
}: {
  orgId: string;
  closed: ClosedDefect;
  canReturn: boolean;
  onReturned: (fleetNumber: string) => void;
  onDismiss: () => void;
}) {
  const release = useReturnToService(orgId);
  const box = useRef<HTMLDivElement>(null);
  // the closed defect leaves the list: bring what happened next into view, where the step is
  useEffect(() => box.current?.focus(), []);
  const { machine, openCriticalDefects: open } = closed;
  const title = `“${closed.data.title}” is closed`;
  const dismiss = (
    <Button variant="ghost" className="mt-2 min-h-12" onClick={onDismiss}>
      Dismiss
    </Button>
  );
  if (machine.status !== 'tagged_out')
    return (
      <div ref={box} tabIndex={-1} className="outline-none">
        <Alert tone="success" title={title}>
          {machine.fleetNumber} is in service.
          {dismiss}
        </Alert>
      </div>
    );
  return (
    <section
      ref={box}
      tabIndex={-1}
      aria-label={`${machine.fleetNumber} stays tagged out`}
      className="flex flex-col gap-3 rounded-xl border-2 border-poppy-300 bg-poppy-50 p-4 outline-none"
    >
      <Alert tone="warning" title={title}>
        <p>
          {machine.fleetNumber} stays tagged out until a technician or manager returns it to
          service, with a note of what was checked.
        </p>
        <p className="mt-1 font-bold">
          {open > 0
            ? `${open} critical ${open === 1 ? 'defect is' : 'defects are'} still open on ${machine.fleetNumber}: close ${open === 1 ? 'it' : 'them'} first.`
            : `No critical defect is open on ${machine.fleetNumber} now.`}
        </p>
      </Alert>
      {open === 0 && canReturn ? (
        <div className="rounded-lg bg-white p-3">
          <ReturnToServiceForm
            fleetNumber={machine.fleetNumber}
            onSubmit={async (note) => {
              await release.mutateAsync({ machineId: machine.id, note });
              onReturned(machine.fleetNumber);
            }}
            onCancel={onDismiss}
          />
        </div>
      ) : (
        <div>{dismiss}</div>
      )}
    </section>
  );
}
