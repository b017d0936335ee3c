import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { ListSkeleton } from '../../../components/ui/skeleton';
import type { UnitSystem } from '../../../../shared/constants';
import type { MachineAbilities, MachineDetail } from '../../../../shared/schemas/machines';
import { useMachineReadings } from '../api/get-machine-readings';
import { MeterReplacementForm } from './meter-replacement-form';
import { ReadingForm } from './reading-form';
import { ReadingHistory } from './reading-history';

/** Log a reading, the history newest first, corrections and meter replacements. */
export function ReadingsSection({
  orgId,
  machine,
  abilities,
  units,
  timeZone,
}: {
  orgId: string;
  machine: MachineDetail['data'];
  abilities: MachineAbilities;
  /** the farm's units: how a typed comma is read */
  units: UnitSystem;
  timeZone: string;
}) {
  const readings = useMachineReadings(orgId, machine.id);
  const [replacing, setReplacing] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const latest = readings.data?.data[0] ?? null;

  return (
    <div className="flex flex-col gap-4">
      {abilities.logReading ? (
        <Card>
          <h3 className="mb-3 text-lg font-black text-field-950">Log a reading</h3>
          {machine.status === 'tagged_out' ? (
            <Alert tone="warning" className="mb-3">
              This machine is tagged out. Log its meter only when reading it, not to use it.
            </Alert>
          ) : null}
          <ReadingForm
            orgId={orgId}
            machineId={machine.id}
            unit={machine.meterUnit}
            units={units}
            timeZone={timeZone}
            latest={latest}
          />
        </Card>
      ) : machine.status === 'sold' ? (
        <Alert tone="info">This machine is sold; its readings are closed.</Alert>
      ) : null}

      {notice ? <Alert tone="success">{notice}</Alert> : null}
      {abilities.replaceMeter ? (
        replacing ? (
          <MeterReplacementForm
            orgId={orgId}
            machineId={machine.id}
            unit={machine.meterUnit}
            units={units}
            timeZone={timeZone}
            onDone={(message) => {
              setReplacing(false);
              setNotice(message || null);
            }}
          />
        ) : (
          <div>
            <Button
              variant="secondary"
              icon="refresh"
              onClick={() => {
                setNotice(null);
                setReplacing(true);
              }}
            >
              Record meter replacement
            </Button>
          </div>
        )
      ) : null}

      <h3 className="text-lg font-black text-field-950">History</h3>
      {readings.isPending ? (
        <ListSkeleton rows={4} label="Loading readings" />
      ) : readings.isError ? (
        <ErrorState
          title="The readings didn't load"
          message={readings.error.message}
          onRetry={() => readings.refetch()}
          retrying={readings.isRefetching}
        />
      ) : (
        <ReadingHistory
          orgId={orgId}
          machineId={machine.id}
          readings={readings.data.data}
          replacements={readings.data.replacements}
          unit={machine.meterUnit}
          units={units}
          timeZone={timeZone}
          canCorrect={abilities.correctReading}
        />
      )}
    </div>
  );
}
