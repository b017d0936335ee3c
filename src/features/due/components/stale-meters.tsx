import { Link } from 'react-router-dom';
import { formatMeter } from '../../../lib/fleet-format';
import { buttonClasses } from '../../../components/ui/button';
import { Section } from '../../../components/ui/card';
import { Icon } from '../../../components/ui/icons';
import type { StaleMeter } from '../api/types';

interface StaleMetersProps {
  stale: StaleMeter[];
  machineHref: (machineId: string) => string;
  /** where to log hours for one machine; absent for roles that do not log hours */
  logHoursHref?: (fleetNumber: string) => string;
}

/**
 * Machines whose meter is stale — the hours that may have gone unrecorded at their pace matter —
 * so the due dates above are less sure than they look.
 */
export function StaleMeters({ stale, machineHref, logHoursHref }: StaleMetersProps) {
  return (
    <Section
      title="Stale meters"
      description="Machines whose hours may have gone unrecorded: at their pace since the last reading, enough to matter for their shortest service interval (a busy combine after two days, a tractor in winter after weeks). Their forecasts drift until the meter is read again."
    >
      {stale.length === 0 ? (
        <p className="flex items-center gap-2 rounded-xl border border-field-200 bg-white p-4 text-field-700">
          <Icon name="check" className="size-5 text-clover-700" />
          Every machine's meter is read recently enough for its pace.
        </p>
      ) : (
        <ul className="divide-y divide-field-100 rounded-xl border border-straw-300 bg-white">
          {stale.map((item) => (
            <li
              key={item.machine.id}
              className="flex flex-col items-start gap-2 p-3 sm:flex-row sm:items-center sm:justify-between sm:p-4"
            >
              <div className="min-w-0">
                <Link
                  to={machineHref(item.machine.id)}
                  className="inline-flex min-h-touch flex-wrap items-center gap-x-1 font-bold text-field-900 underline decoration-field-300 underline-offset-2"
                >
                  {item.machine.fleetNumber}{' '}
                  <span className="font-normal">{item.machine.name}</span>
                </Link>
                <p className="flex items-center gap-1.5 text-sm text-straw-900">
                  <Icon name="clock" className="size-4" />
                  {item.daysSince === null
                    ? 'No reading yet'
                    : `No reading for ${item.daysSince} ${item.daysSince === 1 ? 'day' : 'days'}`}
                  {item.unrecorded
                    ? ` · about ${formatMeter(item.unrecorded, item.unit)} unrecorded`
                    : ''}
                </p>
              </div>
              {logHoursHref ? (
                <Link
                  to={logHoursHref(item.machine.fleetNumber)}
                  className={buttonClasses('secondary')}
                >
                  Log hours<span className="sr-only"> for {item.machine.fleetNumber}</span>
                </Link>
              ) : null}
            </li>
          ))}
        </ul>
      )}
    </Section>
  );
}
