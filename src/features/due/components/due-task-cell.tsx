import { Link } from 'react-router-dom';
import { MachineStatusBadge } from '../../../components/ui/status-badges';
import type { DueRow } from '../api/types';
import { BASIS_TEXT } from './due-format';
import { HazardCaution } from './hazard-caution';

/** Fleet number and name, linking to the machine page; tagged-out machines say so. */
export function DueMachine({ row, href }: { row: DueRow; href: string }) {
  const { machine } = row;
  return (
    <div className="flex flex-col items-start gap-1">
      <Link
        to={href}
        className="font-bold text-field-900 underline decoration-field-300 underline-offset-2 hover:decoration-field-700"
      >
        <span className="whitespace-nowrap">{machine.fleetNumber}</span>{' '}
        <span className="font-normal">{machine.name}</span>
      </Link>
      {machine.status !== 'in_service' ? <MachineStatusBadge status={machine.status} /> : null}
    </div>
  );
}

/** The task's name, its caution sign when it involves a hazard, and how its due point is based. */
export function DueTask({ row, cautionText = false }: { row: DueRow; cautionText?: boolean }) {
  const basis = BASIS_TEXT[row.due.basis];
  return (
    <div className="flex flex-col gap-1">
      <span>
        {row.taskName}
        {cautionText ? null : (
          <>
            {' '}
            <HazardCaution hazards={row.hazards} />
          </>
        )}
      </span>
      {basis ? <span className="text-sm text-field-600">{basis}</span> : null}
      {cautionText ? <HazardCaution hazards={row.hazards} withText /> : null}
    </div>
  );
}
