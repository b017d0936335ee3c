import { useState } from 'react';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { SelectField } from '../../../components/ui/field';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { formatDateTime } from '../../../lib/format';
import { useAuditEvents } from '../api/get-audit-events';
import { describeAuditEvent } from './audit-wording';

/** The farm's audit log of dealer activity: every read, reminder, proposal and service. */
export function DealerActivity({ orgId, timeZone }: { orgId: string; timeZone: string }) {
  const [dealerId, setDealerId] = useState<string | null>(null);
  const log = useAuditEvents(orgId, dealerId);
  if (log.isPending) return <ListSkeleton rows={3} label="Loading dealer activity" />;
  if (log.isError && !log.data)
    return (
      <ErrorState
        title="The activity didn't load"
        message={log.error.message}
        onRetry={() => log.refetch()}
        retrying={log.isRefetching}
      />
    );
  const { data: events, meta, dealers } = log.data;
  return (
    <div className="flex flex-col gap-3">
      {dealers.length > 1 ? (
        <div className="sm:w-72">
          <SelectField
            label="Dealer"
            options={[
              { value: '', label: 'All dealers' },
              ...dealers.map((d) => ({ value: d.id, label: d.name })),
            ]}
            value={dealerId ?? ''}
            onChange={(e) => setDealerId(e.target.value || null)}
          />
        </div>
      ) : null}
      {events.length === 0 ? (
        <EmptyState icon="info" title="No dealer activity yet">
          <p>Each time a dealer looks at your machines or acts on them, it is listed here.</p>
        </EmptyState>
      ) : (
        <>
          <ul
            aria-label="Dealer activity"
            className="divide-y divide-field-100 rounded-xl border border-field-200 bg-white"
          >
            {events.map((e) => (
              <li key={e.id} className="flex flex-col gap-0.5 p-3">
                <p>
                  <span className="font-bold">{e.actor?.name ?? 'Someone'}</span>
                  {e.dealer ? ` (${e.dealer.name})` : ''} {describeAuditEvent(e)}
                </p>
                <p className="text-sm text-field-600">{formatDateTime(e.createdAt, timeZone)}</p>
              </li>
            ))}
          </ul>
          <p className="text-sm text-field-600">
            The latest {events.length} of {meta.total} events.
          </p>
        </>
      )}
    </div>
  );
}
