import { useState } from 'react';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ReturnToServiceForm } from '../../../components/ui/return-to-service-form';
import { useReturnToService } from '../api/return-to-service';
import type { MachineOption } from '../api/types';

/**
 * The machines tagged out right now: nobody may use them. Closing defects does not release one;
 * the shop returns it to service as its own step, with a note of what was checked, once no
 * critical defect is open (the server answers 409 and says how many otherwise).
 */
export function TaggedOutMachines({
  orgId,
  machines,
  canReturn,
  onReturned,
}: {
  orgId: string;
  machines: MachineOption[];
  canReturn: boolean;
  onReturned: (fleetNumber: string) => void;
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
      <p className="text-poppy-900">
        Each stays tagged out until its critical defects are closed and a technician or manager
        returns it to service with a note of what was checked.
      </p>
      <ul className="flex flex-col gap-3">
        {machines.map((machine) => (
          <li key={machine.id}>
            <TaggedOutRow
              orgId={orgId}
              machine={machine}
              canReturn={canReturn}
              onReturned={onReturned}
            />
          </li>
        ))}
      </ul>
    </section>
  );
}

function TaggedOutRow({
  orgId,
  machine,
  canReturn,
  onReturned,
}: {
  orgId: string;
  machine: MachineOption;
  canReturn: boolean;
  onReturned: (fleetNumber: string) => void;
}) {
  const [open, setOpen] = useState(false);
  const release = useReturnToService(orgId);
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
        {canReturn && !open ? (
          <Button variant="secondary" className="min-h-12" onClick={() => setOpen(true)}>
            Return to service…<span className="sr-only"> {machine.fleetNumber}</span>
          </Button>
        ) : null}
      </div>
      {open ? (
        <ReturnToServiceForm
          fleetNumber={machine.fleetNumber}
          onSubmit={async (note) => {
            await release.mutateAsync({ machineId: machine.id, note });
            onReturned(machine.fleetNumber);
          }}
          onCancel={() => setOpen(false)}
        />
      ) : null}
    </div>
  );
}
