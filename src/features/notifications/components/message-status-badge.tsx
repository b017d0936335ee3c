import { Badge, type BadgeTone } from '../../../components/ui/badge';
import type { IconName } from '../../../components/ui/icons';
import type { NotificationStatusName } from '../../../../shared/schemas/notifications';

const STATUS: Record<NotificationStatusName, { tone: BadgeTone; icon: IconName; label: string }> = {
  sent: { tone: 'ok', icon: 'check', label: 'Sent' },
  queued: { tone: 'due-soon', icon: 'clock', label: 'Queued' },
  sending: { tone: 'due-soon', icon: 'mail', label: 'Sending' },
  failed: { tone: 'overdue', icon: 'error', label: 'Failed' },
};

export const messageStatusLabel = (status: NotificationStatusName) => STATUS[status].label;

/** Sent, queued (waiting or retrying), sending or failed: word and icon as well as colour. */
export function MessageStatusBadge({ status }: { status: NotificationStatusName }) {
  const { tone, icon, label } = STATUS[status];
  return (
    <Badge tone={tone} icon={icon}>
      {label}
    </Badge>
  );
}
