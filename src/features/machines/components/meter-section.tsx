import { lazy, Suspense, useState } from 'react';
import { ChoiceChips } from '../../../components/ui/choice-chips';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { Skeleton } from '../../../components/ui/skeleton';
import { Card } from '../../../components/ui/card';
import type { UseQueryResult } from '@tanstack/react-query';
import { meterName, useMeterReadings, type MachineMeterJson } from '../../../lib/meters';
import type { MachineDetail, ReadingHistory, Usage } from '../api/types';

// recharts is most of the bundle's weight: it loads only when a machine page shows a chart, so the
// fleet list and the log-hours screen stay light on a phone.
const MeterChart = lazy(() => import('./meter-chart').then((m) => ({ default: m.MeterChart })));

function ChartSkeleton({ label }: { label: string }) {
  return (
    <div role="status">
      <span className="sr-only">{label}</span>
      <Skeleton className="h-80 w-full rounded-xl" />
    </div>
  );
}

type Due = { taskName: string; dueMeter: number; meterId?: string };

/**
 * The "Meters" chart part: with one meter, its chart; with several, a choice of which meter to
 * chart, each with its own readings, trend and the due points of the tasks counting on it.
 */
export function MeterSection({
  orgId,
  readings,
  machine,
  meters,
  dues,
  services,
  timeZone,
}: {
  /** the organization of the machine: needed, with `meters`, to chart its other meters */
  orgId?: string;
  /** the primary meter's readings (the page fetches them: they belong to the readings feature) */
  readings: UseQueryResult<ReadingHistory>;
  machine: MachineDetail['data'];
  /** the machine's meters, primary first (while they load, only the primary is charted) */
  meters?: MachineMeterJson[];
  /** the next due meter of each task (from the schedule) and the meter it counts on */
  dues: Due[];
  /** completed service visits (date done, lifetime meter), marked on the primary meter's line */
  services?: { performedOn: string; meter: number; label: string }[];
  timeZone: string;
}) {
  const [chosenId, setChosenId] = useState('');
  const primary = meters?.find((m) => m.isPrimary);
  const chosen = meters?.find((m) => m.id === chosenId && !m.isPrimary);
  const duesOn = (meterId: string | undefined) =>
    meterId ? dues.filter((d) => d.meterId === meterId) : dues;
  return (
    <div className="flex flex-col gap-4">
      {orgId && meters && meters.length > 1 ? (
        <ChoiceChips
          legend="Chart of"
          value={chosen?.id ?? ''}
          onChange={setChosenId}
          options={meters.map((m) => ({ value: m.isPrimary ? '' : m.id, label: meterName(m) }))}
        />
      ) : null}
      {chosen && orgId ? (
        <OtherMeterChart
          orgId={orgId}
          machineId={machine.id}
          meter={chosen}
          dues={duesOn(chosen.id)}
          timeZone={timeZone}
        />
      ) : (
        <MeterChartPart
          readings={readings}
          usage={machine.usage}
          dues={duesOn(primary?.id)}
          services={services}
          unit={machine.meterUnit}
          timeZone={timeZone}
        />
      )}
    </div>
  );
}

/** A meter other than the primary: its own readings, fetched when it is chosen. */
function OtherMeterChart({
  orgId,
  machineId,
  meter,
  dues,
  timeZone,
}: {
  orgId: string;
  machineId: string;
  meter: MachineMeterJson;
  dues: Due[];
  timeZone: string;
}) {
  const readings = useMeterReadings(orgId, machineId, meter.id);
  return (
    <MeterChartPart
      readings={readings}
      usage={meter.usage}
      dues={dues}
      unit={meter.unit}
      timeZone={timeZone}
    />
  );
}

/** One meter's chart, or why there is none. */
function MeterChartPart({
  readings,
  usage,
  dues,
  services,
  unit,
  timeZone,
}: {
  readings: UseQueryResult<ReadingHistory>;
  usage: Usage | null;
  dues: Due[];
  services?: { performedOn: string; meter: number; label: string }[];
  unit: string;
  timeZone: string;
}) {
  if (readings.isPending) {
    return <ChartSkeleton label="Loading the meter chart" />;
  }
  if (readings.isError) {
    return (
      <ErrorState
        title="The meter history didn't load"
        message={readings.error.message}
        onRetry={() => readings.refetch()}
        retrying={readings.isRefetching}
      />
    );
  }
  if (readings.data.data.length === 0) {
    return (
      <EmptyState icon="gauge" title="No meter history yet">
        <p>Log the meter below; the chart and the forecast start from the first readings.</p>
      </EmptyState>
    );
  }
  return (
    <Card>
      <Suspense fallback={<ChartSkeleton label="Loading the meter chart" />}>
        <MeterChart
          readings={readings.data.data}
          replacements={readings.data.replacements}
          usage={usage}
          dues={dues}
          services={services}
          unit={unit}
          timeZone={timeZone}
        />
      </Suspense>
    </Card>
  );
}
