import { useState } from 'react';
import { CATEGORY_LABELS, METER_UNIT_LABELS } from '../../../../shared/constants';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { isApiError } from '../../../lib/api-client';
import { useCurrentMembership } from '../../../lib/auth';
import { formatMoney } from '../../../lib/format';
import { useOperators } from '../api/get-operators';
import type { MachineAbilities, MachineDetail } from '../api/types';
import { useUpdateMachine } from '../api/update-machine';
import { formatSeason } from '../lib/season-months';
import { MachineForm } from './machine-form';
import { MachinePhoto } from './machine-photo';

/** The machine's own fields; a manager edits them here or retires the machine as sold. */
export function MachineDetails({
  orgId,
  machine,
  abilities,
}: {
  orgId: string;
  machine: MachineDetail['data'];
  abilities: MachineAbilities;
}) {
  const { currency } = useCurrentMembership().membership.organization;
  const price = (minor: number | null) =>
    minor !== null ? formatMoney(minor, currency, { whole: true }) : '—';
  const [editing, setEditing] = useState(false);
  const [confirmingRetire, setConfirmingRetire] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const update = useUpdateMachine(orgId, machine.id);
  const retire = useUpdateMachine(orgId, machine.id);
  const operators = useOperators(orgId);

  if (editing) {
    return (
      <Card>
        <h3 className="mb-4 text-lg font-black text-field-950">Edit {machine.fleetNumber}</h3>
        <MachineForm
          orgId={orgId}
          machine={machine}
          submitLabel="Save machine"
          onSubmit={async (_values, changed) => {
            if (Object.keys(changed).length) await update.mutateAsync(changed);
            setEditing(false);
            setNotice('Machine saved.');
          }}
          onCancel={() => setEditing(false)}
        />
      </Card>
    );
  }

  const operatorNames = machine.operatorIds.map(
    (id) => operators.data?.find((o) => o.userId === id)?.name ?? 'An operator',
  );
  const rows: [string, string][] = [
    ['Fleet number', machine.fleetNumber],
    ['Name', machine.name],
    ['Category', CATEGORY_LABELS[machine.category]],
    ['Make', machine.make || '—'],
    ['Model', machine.model || '—'],
    ['Serial number', machine.serialNumber || '—'],
    ['Telematics id', machine.telematicsId ?? '—'],
    ['Year', machine.year?.toString() ?? '—'],
    ['Meter unit', `${METER_UNIT_LABELS[machine.meterUnit]} (${machine.meterUnit})`],
    ['Purchase price', price(machine.purchasePriceMinor)],
    ['List price', price(machine.listPriceMinor)],
    ['Season', formatSeason(machine.seasonMonths)],
    [
      'Assigned operators',
      operatorNames.length ? operatorNames.join(', ') : 'None (every operator sees it)',
    ],
  ];

  return (
    <div className="flex flex-col gap-4">
      {notice ? <Alert tone="success">{notice}</Alert> : null}
      <Card>
        <div className="mb-4">
          <MachinePhoto orgId={orgId} machine={machine} canEdit={abilities.update} />
        </div>
        <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2">
          {rows.map(([term, detail]) => (
            <div key={term} className="flex flex-col">
              <dt className="text-sm font-bold text-field-600">{term}</dt>
              <dd className="text-field-950">{detail}</dd>
            </div>
          ))}
          {machine.notes ? (
            <div className="flex flex-col sm:col-span-2">
              <dt className="text-sm font-bold text-field-600">Notes</dt>
              <dd className="whitespace-pre-line text-field-950">{machine.notes}</dd>
            </div>
          ) : null}
        </dl>
      </Card>
      {abilities.update ? (
        <div className="flex flex-wrap gap-2">
          <Button
            variant="secondary"
            onClick={() => {
              setNotice(null);
              setEditing(true);
            }}
          >
            Edit
          </Button>
          {machine.status !== 'sold' ? (
            <Button variant="ghost" icon="close" onClick={() => setConfirmingRetire(true)}>
              Retire (sold)
            </Button>
          ) : null}
        </div>
      ) : null}
      <ConfirmDialog
        open={confirmingRetire}
        title={`Retire ${machine.fleetNumber} as sold?`}
        confirmLabel="Retire as sold"
        pending={retire.isPending}
        error={
          retire.error
            ? isApiError(retire.error)
              ? retire.error.message
              : 'Could not retire the machine. Try again.'
            : null
        }
        onCancel={() => {
          setConfirmingRetire(false);
          retire.reset();
        }}
        onConfirm={() =>
          retire.mutate(
            { status: 'sold' },
            {
              onSuccess: () => {
                setConfirmingRetire(false);
                setNotice(`${machine.fleetNumber} is retired as sold.`);
              },
            },
          )
        }
      >
        {machine.name} leaves the due list and no new readings can be logged. Its history stays, and
        a manager can set its status back by editing it.
      </ConfirmDialog>
    </div>
  );
}
