import { Link } from 'react-router-dom';
import { CATEGORY_LABELS } from '../../../../shared/constants';
import { cx } from '../../../components/ui/cx';
import { Icon } from '../../../components/ui/icons';
import {
  DueStatusBadge,
  MachineStatusBadge,
  RestrictedBadge,
} from '../../../components/ui/status-badges';
import { formatLocalDate } from '../../../lib/fleet-format';
import type { Machine } from '../api/types';
import { MeterReadingSummary } from './meter-reading-summary';

/** The fleet on a phone: one card per machine, the whole card a link to the machine's page. */
export function FleetCards({
  machines,
  machineHref,
  timeZone,
  refreshing,
}: {
  machines: Machine[];
  machineHref: (id: string) => string;
  timeZone: string;
  refreshing: boolean;
}) {
  return (
    <ul
      className={cx('flex flex-col gap-3', refreshing && 'opacity-60')}
      aria-busy={refreshing}
      aria-label="Fleet"
    >
      {machines.map((machine) => (
        <li key={machine.id}>
          <Link
            to={machineHref(machine.id)}
            className={cx(
              'flex flex-col gap-3 rounded-xl border bg-white p-4 shadow-card hover:border-field-400',
              machine.status === 'tagged_out' ? 'border-2 border-poppy-400' : 'border-field-200',
            )}
          >
            <span className="flex items-start justify-between gap-2">
              <span className="min-w-0">
                <span className="block text-lg font-black text-field-950">
                  {machine.fleetNumber}
                </span>
                <span className="block text-field-800">{machine.name}</span>
                <span className="block text-sm text-field-600">
                  {CATEGORY_LABELS[machine.category]}
                </span>
              </span>
              <Icon name="back" className="mt-1 size-5 rotate-180 text-field-400" />
            </span>
            <span className="flex flex-wrap gap-2">
              {machine.status !== 'in_service' ? (
                <MachineStatusBadge status={machine.status} />
              ) : null}
              {machine.restriction ? <RestrictedBadge /> : null}
              {machine.dueStatus ? <DueStatusBadge status={machine.dueStatus} /> : null}
            </span>
            {machine.restriction?.reason ? (
              <span className="text-sm font-bold text-straw-900">{machine.restriction.reason}</span>
            ) : null}
            <span className="grid grid-cols-2 gap-3 text-sm">
              <span className="flex flex-col">
                <span className="text-xs font-bold tracking-wide text-field-600 uppercase">
                  Meter
                </span>
                <MeterReadingSummary
                  lastReading={machine.lastReading}
                  unit={machine.meterUnit}
                  timeZone={timeZone}
                />
              </span>
              <span className="flex flex-col">
                <span className="text-xs font-bold tracking-wide text-field-600 uppercase">
                  Next due
                </span>
                <span className="font-bold text-field-950">
                  {machine.nextDueDate ? formatLocalDate(machine.nextDueDate) : '—'}
                </span>
              </span>
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
