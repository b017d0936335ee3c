import {
  SERVICE_STATUS_LABELS,
  type ServiceStatus,
} from '../../../../shared/schemas/service-records';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import type { IconName } from '../../../components/ui/icons';
import type { SpecStatus } from '../api/types';
import { SPEC_STATUS_TEXT } from '../lib/record-format';

// Statuses as words with an icon; the colour only repeats what the words say.

const RECORD: Record<ServiceStatus, { tone: BadgeTone; icon: IconName }> = {
  planned: { tone: 'info', icon: 'clock' },
  completed: { tone: 'ok', icon: 'check' },
  cancelled: { tone: 'neutral', icon: 'close' },
};

export function RecordStatusBadge({ status }: { status: ServiceStatus }) {
  const { tone, icon } = RECORD[status];
  return (
    <Badge tone={tone} icon={icon}>
      {SERVICE_STATUS_LABELS[status]}
    </Badge>
  );
}

const SPEC: Record<SpecStatus, { tone: BadgeTone; icon: IconName }> = {
  in: { tone: 'ok', icon: 'check' },
  low: { tone: 'overdue', icon: 'alert' },
  high: { tone: 'overdue', icon: 'alert' },
};

export function SpecStatusBadge({ status }: { status: SpecStatus | null }) {
  if (!status) return <Badge tone="neutral">No spec</Badge>;
  const { tone, icon } = SPEC[status];
  return (
    <Badge tone={tone} icon={icon}>
      {SPEC_STATUS_TEXT[status]}
    </Badge>
  );
}
