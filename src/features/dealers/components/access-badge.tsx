import { DEALER_ACCESS_LABELS, type DealerAccess } from '../../../../shared/schemas/dealers';
import { Badge } from '../../../components/ui/badge';

/** A link's access as a badge: its word and icon as well as its colour. */
export function AccessBadge({ access }: { access: DealerAccess }) {
  return (
    <Badge
      tone={access === 'service' ? 'accent' : 'info'}
      icon={access === 'service' ? 'check' : 'info'}
    >
      {DEALER_ACCESS_LABELS[access]} access
    </Badge>
  );
}
