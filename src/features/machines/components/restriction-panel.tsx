import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { RestrictionNotice } from '../../../components/ui/restriction-notice';
import { useLiftRestriction } from '../api/lift-restriction';
import { useSetRestriction } from '../api/set-restriction';
import type { MachineAbilities, MachineDetail } from '../api/types';
import { LiftRestrictionForm, RestrictForm } from './restriction-forms';

type Open = 'restrict' | 'lift' | null;

/**
 * Restricted use on the machine page: the reason in full while there is one, and for the farm's
 * technicians and managers the step that sets, changes or lifts it. Nothing for others when the
 * machine is not restricted.
 */
export function RestrictionPanel({
  orgId,
  machine,
  abilities,
  timeZone,
}: {
  orgId: string;
  machine: MachineDetail['data'];
  abilities: Pick<MachineAbilities, 'restrict' | 'liftRestriction'>;
  timeZone: string;
}) {
  const [open, setOpen] = useState<Open>(null);
  const restrict = useSetRestriction(orgId, machine.id);
  const lift = useLiftRestriction(orgId, machine.id);
  const { restriction, fleetNumber } = machine;
  if (!restriction && !abilities.restrict) return null;

  const forms =
    open === 'restrict' ? (
      <RestrictForm
        fleetNumber={fleetNumber}
        current={restriction?.reason ?? null}
        onSubmit={async (reason) => {
          await restrict.mutateAsync(reason);
          setOpen(null);
        }}
        onCancel={() => setOpen(null)}
      />
    ) : open === 'lift' ? (
      <LiftRestrictionForm
        fleetNumber={fleetNumber}
        onSubmit={async (note) => {
          await lift.mutateAsync(note);
          setOpen(null);
        }}
        onCancel={() => setOpen(null)}
      />
    ) : null;

  return (
    <section
      aria-label={
        restriction ? `${fleetNumber} is restricted` : `Restrict the use of ${fleetNumber}`
      }
      className="flex flex-col gap-3"
    >
      {restriction ? (
        <RestrictionNotice
          fleetNumber={fleetNumber}
          restriction={restriction}
          timeZone={timeZone}
          taggedOut={machine.status === 'tagged_out'}
        />
      ) : null}
      {forms ? (
        <div className="rounded-lg border border-field-200 bg-white p-3">{forms}</div>
      ) : (
        <div className="flex flex-wrap gap-2">
          {abilities.restrict ? (
            <Button variant="secondary" className="min-h-12" onClick={() => setOpen('restrict')}>
              {restriction ? 'Change the reason…' : 'Restrict use…'}
            </Button>
          ) : null}
          {abilities.liftRestriction ? (
            <Button variant="secondary" className="min-h-12" onClick={() => setOpen('lift')}>
              Lift the restriction…
            </Button>
          ) : null}
        </div>
      )}
    </section>
  );
}
