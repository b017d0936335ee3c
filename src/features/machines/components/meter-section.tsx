import { lazy, Suspense } from 'react';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { Skeleton } from '../../../components/ui/skeleton';
import { Card } from '../../../components/ui/card';
import type { UseQueryResult } from '@tanstack/react-query';
import type { MachineDetail, ReadingHistory } from '../api/types';

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

/** The "Meter" section: the chart of the machine's readings, or why there is none. */
export function MeterSection({
  readings,
  machine,
  dues,
  services,
  timeZone,
}: {
  /** the machine's readings (the page fetches them: they belong to the readings feature) */
  readings: UseQueryResult<ReadingHistory>;
  machine: MachineDetail['data'];
  /** the next due meter of each task (from the schedule), for the reference lines */
  dues: { taskName: string; dueMeter: number }[];
  /** completed service visits (date done, lifetime meter), marked on the line */
  services?: { performedOn: string; meter: number; label: string }[];
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
          usage={machine.usage}
          dues={dues}
          services={services}
          unit={machine.meterUnit}
          timeZone={timeZone}
        />
      </Suspense>
    </Card>
  );
}
