import { DUE_STATUS_LABELS, MACHINE_STATUS_LABELS } from '../../../shared/constants';
import type { DueStatus } from '../../../shared/domain/types';
import type { MachineStatus } from '../../../shared/constants';
import { Badge, type BadgeTone } from './badge';
import type { IconName } from './icons';

// The statuses of the fleet as badges: every one has its own word and icon as well as its colour.

const DUE: Record<DueStatus, { tone: BadgeTone; icon: IconName }> = {
  overdue: { tone: 'overdue', icon: 'error' },
  due_soon: { tone: 'due-soon', icon: 'clock' },
  history_unknown: { tone: 'accent', icon: 'alert' },
  ok: { tone: 'ok', icon: 'check' },
  no_forecast: { tone: 'neutral', icon: 'info' },
};

export function DueStatusBadge({ status, className }: { status: DueStatus; className?: string }) {
  const { tone, icon } = DUE[status];
  return (
    <Badge tone={tone} icon={icon} className={className}>
      {DUE_STATUS_LABELS[status]}
    </Badge>
  );
}

const MACHINE: Record<MachineStatus, { tone: BadgeTone; icon: IconName }> = {
  in_service: { tone: 'ok', icon: 'check' },
  tagged_out: { tone: 'overdue', icon: 'lock' },
  sold: { tone: 'neutral', icon: 'close' },
};

export function MachineStatusBadge({
  status,
  className,
}: {
  status: MachineStatus;
  className?: string;
}) {
  const { tone, icon } = MACHINE[status];
  return (
    <Badge tone={tone} icon={icon} className={className}>
      {MACHINE_STATUS_LABELS[status]}
    </Badge>
  );
}

/** A machine in service but restricted in use: its own word and icon, beside its status. */
export function RestrictedBadge({ className }: { className?: string }) {
  return (
    <Badge tone="due-soon" icon="alert" className={className}>
      Restricted use
    </Badge>
  );
}
