import { Link } from 'react-router-dom';
import { Caution } from '../../../components/ui/caution';
import { MachineStatusBadge, RestrictedBadge } from '../../../components/ui/status-badges';
import { boundMeterName } from '../../../lib/meters';
import type { DueRow } from '../api/types';
import { BASIS_TEXT } from './due-format';

/** Fleet number and name, linking to the machine page; tagged-out and restricted machines say so. */
export function DueMachine({ row, href }: { row: DueRow; href: string }) {
  const { machine } = row;
  return (
    <div className="flex flex-col items-start gap-1">
      <Link
        to={href}
        className="inline-flex min-h-touch flex-wrap items-center gap-x-1 font-bold text-field-900 underline decoration-field-300 underline-offset-2 hover:decoration-field-700"
      >
        <span className="whitespace-nowrap">{machine.fleetNumber}</span>{' '}
        <span className="font-normal">{machine.name}</span>
      </Link>
      {machine.status !== 'in_service' ? <MachineStatusBadge status={machine.status} /> : null}
      {machine.restricted ? <RestrictedBadge /> : null}
    </div>
  );
}

/**
 * The task's name, how its due point is based, and its hazards named ("Caution: Hot fluids — what
 * to do", the full words a tap away), in the table and on phones.
 */
export function DueTask({ row }: { row: DueRow }) {
  const basis = BASIS_TEXT[row.due.basis];
  const meter = boundMeterName(row.meter);
  return (
    <div className="flex flex-col gap-1">
      <span>{row.taskName}</span>
      {meter ? <span className="text-sm font-bold text-field-800">Counts on {meter}</span> : null}
      {basis ? <span className="text-sm text-field-600">{basis}</span> : null}
      {row.hazards.length ? (
        <Caution variant="summary" heading="Caution." hazards={row.hazards} defer />
      ) : null}
    </div>
  );
}
