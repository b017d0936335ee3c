import { lazy, Suspense, useId, useState } from 'react';
import { Card } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { Skeleton } from '../../../components/ui/skeleton';
import { formatLocalDate } from '../../../lib/fleet-format';
import { useMeasurementNames, useMeasurementSeries } from '../api/get-measurements';
import { formatQuantity } from '../lib/record-format';

// recharts loads only when a chart is drawn (it is most of the bundle's weight).
const MeasurementChart = lazy(() =>
  import('./measurement-chart').then((m) => ({ default: m.MeasurementChart })),
);

function ChartSkeleton() {
  return (
    <div role="status">
      <span className="sr-only">Loading the measurement chart</span>
      <Skeleton className="h-64 w-full rounded-xl" />
    </div>
  );
}

/** One measurement of the machine's visits over time, picked from the ones it has. */
export function MeasurementsSection({
  orgId,
  machineId,
  meterUnit,
}: {
  orgId: string;
  machineId: string;
  meterUnit: string;
}) {
  const pickerId = useId();
  const names = useMeasurementNames(orgId, machineId);
  const [picked, setPicked] = useState<string | null>(null);
  // the one with the most readings is the most telling to start with
  const first = names.data?.length
    ? [...names.data].sort((a, b) => b.count - a.count)[0].name
    : null;
  const name = picked ?? first;
  const series = useMeasurementSeries(orgId, machineId, name);

  if (names.isPending) return <ChartSkeleton />;
  if (names.isError)
    return (
      <ErrorState
        title="The measurements didn't load"
        message={names.error.message}
        onRetry={() => names.refetch()}
        retrying={names.isRefetching}
      />
    );
  if (names.data.length === 0)
    return (
      <EmptyState icon="gauge" title="No measurements yet">
        <p>Pressures, clearances and voltages recorded on service visits are charted here.</p>
      </EmptyState>
    );

  return (
    <Card>
      <div className="flex flex-col gap-4">
        <div className="flex flex-col gap-1.5 sm:max-w-md">
          <label htmlFor={pickerId} className="font-bold text-field-900">
            Measurement
          </label>
          <select
            id={pickerId}
            value={name ?? ''}
            onChange={(event) => setPicked(event.target.value)}
            className="min-h-touch w-full appearance-auto rounded-lg border border-field-300 bg-white px-3 py-2 text-base"
          >
            {names.data.map((m) => (
              <option key={m.name} value={m.name}>
                {m.name} ({m.count}, last {formatQuantity(m.lastValue)}
                {m.unit ? ` ${m.unit}` : ''} on {formatLocalDate(m.lastOn)})
              </option>
            ))}
          </select>
        </div>
        {series.isPending ? (
          <ChartSkeleton />
        ) : series.isError ? (
          <ErrorState
            title="This measurement didn't load"
            message={series.error.message}
            onRetry={() => series.refetch()}
            retrying={series.isRefetching}
          />
        ) : (
          <Suspense fallback={<ChartSkeleton />}>
            <MeasurementChart name={name ?? ''} points={series.data} meterUnit={meterUnit} />
          </Suspense>
        )}
      </div>
    </Card>
  );
}
