import type { MachineRestriction } from '../../../shared/schemas/machine-restrictions';
import { formatDateTime } from '../../lib/format';
import { Alert } from './alert';

/**
 * A machine restricted in use, said in full wherever someone may pick it up (the walkaround's
 * start screen and picker, the machine page): what it may not be used for and why, since when,
 * and that it may still be walked round and used within the limit. Never a hover-only hint.
 */
export function RestrictionNotice({
  fleetNumber,
  restriction,
  timeZone,
  taggedOut = false,
  className,
}: {
  fleetNumber: string;
  restriction: MachineRestriction;
  timeZone: string;
  /** the tag-out rules while it lasts; the restriction is still there when it is lifted */
  taggedOut?: boolean;
  className?: string;
}) {
  return (
    <Alert tone="warning" title={`Restricted use — ${fleetNumber}`} className={className}>
      <p className="text-lg font-black">
        {restriction.reason ?? 'The farm has restricted its use; ask the farm what for.'}
      </p>
      <p className="mt-1 text-sm">
        Restricted {formatDateTime(restriction.since, timeZone)}.{' '}
        {taggedOut
          ? 'It is tagged out now; when it is back in service it stays restricted until a technician or manager lifts it.'
          : 'It may be walked round and used within this limit; a technician or manager lifts it once it is fixed.'}
      </p>
    </Alert>
  );
}
