import {
  DEFECT_SEVERITY_LABELS,
  DEFECT_STATUS_LABELS,
  type DefectSeverity,
  type DefectStatus,
} from '../../../../shared/schemas/defects';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import type { IconName } from '../../../components/ui/icons';

// Severity and status each read as a word with its own icon; colour only adds to them.
const SEVERITY: Record<DefectSeverity, { tone: BadgeTone; icon: IconName }> = {
  critical: { tone: 'overdue', icon: 'lock' },
  major: { tone: 'due-soon', icon: 'error' },
  minor: { tone: 'info', icon: 'alert' },
};

const STATUS: Record<DefectStatus, { tone: BadgeTone; icon: IconName }> = {
  open: { tone: 'neutral', icon: 'info' },
  in_repair: { tone: 'accent', icon: 'refresh' },
  fixed: { tone: 'ok', icon: 'check' },
};

export function SeverityBadge({ severity }: { severity: DefectSeverity }) {
  const { tone, icon } = SEVERITY[severity];
  return (
    <Badge tone={tone} icon={icon}>
      {DEFECT_SEVERITY_LABELS[severity]}
    </Badge>
  );
}

export function DefectStatusBadge({ status }: { status: DefectStatus }) {
  const { tone, icon } = STATUS[status];
  return (
    <Badge tone={tone} icon={icon}>
      {DEFECT_STATUS_LABELS[status]}
    </Badge>
  );
}
