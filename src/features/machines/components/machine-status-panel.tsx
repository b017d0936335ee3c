import { Alert } from '../../../components/ui/alert';
import {
  DueStatusBadge,
  MachineStatusBadge,
  RestrictedBadge,
} from '../../../components/ui/status-badges';
import { formatLocalDate, formatRate } from '../../../lib/fleet-format';
import type { MachineAbilities, MachineDetail } from '../api/types';
import { MeterReadingSummary } from './meter-reading-summary';
import { RestrictionPanel } from './restriction-panel';
import { TagOutPanel } from './tag-out-panel';

/**
 * The top of a machine's page: whether it may be used (tagged out, restricted), where its meter
 * stands, how fast it runs.
 */
export function MachineStatusPanel({
  orgId,
  machine,
  abilities,
  timeZone,
  defectsHref,
}: {
  orgId: string;
  machine: MachineDetail['data'];
  abilities: Pick<MachineAbilities, 'returnToService' | 'restrict' | 'liftRestriction'>;
  timeZone: string;
  /** the machine's defects (farm members) */
  defectsHref?: string;
}) {
  const { usage } = machine;
  return (
    <div className="flex flex-col gap-4">
      <TagOutPanel
        orgId={orgId}
        machine={machine}
        abilities={abilities}
        timeZone={timeZone}
        defectsHref={defectsHref}
      />
      <RestrictionPanel orgId={orgId} machine={machine} abilities={abilities} timeZone={timeZone} />
      {machine.status === 'sold' ? (
        <Alert tone="info" title="Sold">
          This machine has left the fleet. Its history stays here; no new readings are taken.
        </Alert>
      ) : null}
      <dl className="grid grid-cols-2 gap-4 rounded-xl border border-field-200 bg-white p-4 shadow-card sm:grid-cols-4">
        <div className="flex flex-col gap-1">
          <dt className="text-sm font-bold text-field-600">Status</dt>
          <dd>
            <MachineStatusBadge status={machine.status} />
            {machine.restriction ? <RestrictedBadge className="mt-1" /> : null}
          </dd>
        </div>
        <div className="flex flex-col gap-1">
          <dt className="text-sm font-bold text-field-600">Due state</dt>
          <dd>
            {machine.dueStatus ? (
              <DueStatusBadge status={machine.dueStatus} />
            ) : (
              <span className="text-field-600">No schedule</span>
            )}
            {machine.nextDueDate ? (
              <span className="mt-1 block text-sm text-field-700">
                Next {formatLocalDate(machine.nextDueDate)}
              </span>
            ) : null}
          </dd>
        </div>
        <div className="flex flex-col gap-1">
          <dt className="text-sm font-bold text-field-600">Meter</dt>
          <dd>
            <MeterReadingSummary
              lastReading={machine.lastReading}
              unit={machine.meterUnit}
              timeZone={timeZone}
            />
          </dd>
        </div>
        <div className="col-span-2 flex flex-col gap-1 sm:col-span-1">
          <dt className="text-sm font-bold text-field-600">Usage estimate</dt>
          <dd>
            {usage && usage.method !== 'none' ? (
              <>
                <span className="block text-lg font-black text-field-950 tabular-nums">
                  {usage.method === 'season' && usage.high === 0
                    ? // before its season: no use in the next 30 days, its season dated from past years
                      'Idle for the next 30 days'
                    : `≈ ${formatRate(usage.rate)} ${machine.meterUnit}/day (${formatRate(usage.low)}–${formatRate(usage.high)})`}
                </span>
                <span className="block text-sm text-field-700">{usage.explanation}</span>
                <span className="block text-sm text-field-600">
                  From {usage.readingCount} readings
                </span>
              </>
            ) : (
              <>
                <span className="block font-bold text-field-800">No estimate yet</span>
                <span className="block text-sm text-field-700">
                  {usage?.explanation ?? 'A few readings a week apart make a first estimate.'}
                </span>
              </>
            )}
          </dd>
        </div>
      </dl>
    </div>
  );
}
