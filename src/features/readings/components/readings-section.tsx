import { useState } from 'react';
import type { UseQueryResult } from '@tanstack/react-query';
import { ChoiceChips } from '../../../components/ui/choice-chips';
import { Alert } from '../../../components/ui/alert';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { ListSkeleton } from '../../../components/ui/skeleton';
import type { UnitSystem } from '../../../../shared/constants';
import type { MachineAbilities, MachineDetail } from '../../../../shared/schemas/machines';
import {
  meterName,
  useMachineMeters,
  useMeterReadings,
  type MachineMeterJson,
} from '../../../lib/meters';
import { useMachineReadings } from '../api/get-machine-readings';
import type { ReadingHistory as History } from '../api/types';
import { ReadingForm } from './reading-form';
import { ReadingHistory } from './reading-history';

/**
 * Log a reading (on a chosen meter when the machine has several, or a counter reset on a counting
 * meter), the history of each meter newest first, and corrections. A meter replacement is
 * recorded from that meter's panel under Meters.
 */
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
  const meters = useMachineMeters(orgId, machine.id);
  const meterList = meters.data?.data ?? [];
  const [shownId, setShownId] = useState('');
  const shown = meterList.find((m) => m.id === shownId && !m.isPrimary);
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
            meters={meterList}
          />
        </Card>
      ) : machine.status === 'sold' ? (
        <Alert tone="info">This machine is sold; its readings are closed.</Alert>
      ) : null}

      <h3 className="text-lg font-black text-field-950">History</h3>
      {meterList.length > 1 ? (
        <ChoiceChips
          legend="Readings of"
          value={shown?.id ?? ''}
          onChange={setShownId}
          options={meterList.map((m) => ({ value: m.isPrimary ? '' : m.id, label: meterName(m) }))}
        />
      ) : null}
      {shown ? (
        <OtherMeterHistory
          orgId={orgId}
          machineId={machine.id}
          meter={shown}
          units={units}
          timeZone={timeZone}
          canCorrect={abilities.correctReading}
        />
      ) : (
        <HistoryPart
          orgId={orgId}
          machineId={machine.id}
          readings={readings}
          unit={machine.meterUnit}
          units={units}
          timeZone={timeZone}
          canCorrect={abilities.correctReading}
        />
      )}
    </div>
  );
}

interface HistoryProps {
  orgId: string;
  machineId: string;
  units: UnitSystem;
  timeZone: string;
  canCorrect: boolean;
}

/** A meter other than the primary: its readings, fetched when it is chosen. */
function OtherMeterHistory({ meter, ...props }: HistoryProps & { meter: MachineMeterJson }) {
  const readings = useMeterReadings(props.orgId, props.machineId, meter.id);
  return <HistoryPart {...props} readings={readings} unit={meter.unit} />;
}

/** One meter's readings, newest first, or why they are not shown. */
function HistoryPart({
  readings,
  unit,
  ...props
}: HistoryProps & { readings: UseQueryResult<History>; unit: string }) {
  if (readings.isPending) return <ListSkeleton rows={4} label="Loading readings" />;
  if (readings.isError)
    return (
      <ErrorState
        title="The readings didn't load"
        message={readings.error.message}
        onRetry={() => readings.refetch()}
        retrying={readings.isRefetching}
      />
    );
  return (
    <ReadingHistory
      {...props}
      readings={readings.data.data}
      replacements={readings.data.replacements}
      unit={unit}
    />
  );
}
