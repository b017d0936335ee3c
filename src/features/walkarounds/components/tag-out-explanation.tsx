import { formatDateTime } from '../../../lib/format';
import { useFarmContacts } from '../api/get-farm-contacts';
import { useTagOut } from '../api/get-tag-out';

/** "A and B" / "A, B and C": names inside a sentence. */
export const nameList = (names: readonly string[]) =>
  names.length > 1 ? `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}` : names[0];

/**
 * Why a machine is tagged out, since when, and whom to ask to clear it (the farm's technicians and
 * managers, by name). Loaded when shown; while loading it says only what is certain.
 */
export function TagOutExplanation({
  orgId,
  machineId,
  timeZone,
}: {
  orgId: string;
  machineId: string;
  timeZone: string;
}) {
  const tagOut = useTagOut(orgId, machineId);
  const contacts = useFarmContacts(orgId);
  const state = tagOut.data;
  const shop = contacts.data?.shop ?? [];
  return (
    <dl className="flex flex-col gap-1.5 text-field-900">
      <div>
        <dt className="inline font-bold">Why: </dt>
        <dd className="inline">
          {tagOut.isPending
            ? 'loading…'
            : state?.reason
              ? `${state.reason}.`
              : 'no reason was recorded.'}
          {state?.openCriticalDefects
            ? ` ${state.openCriticalDefects} critical ${state.openCriticalDefects === 1 ? 'defect is' : 'defects are'} open.`
            : ''}
        </dd>
      </div>
      <div>
        <dt className="inline font-bold">Since: </dt>
        <dd className="inline">
          {state?.since
            ? formatDateTime(state.since, timeZone)
            : tagOut.isPending
              ? '…'
              : 'not recorded'}
        </dd>
      </div>
      <div>
        <dt className="inline font-bold">Who to ask: </dt>
        <dd className="inline">
          {shop.length
            ? `${nameList(shop)} (a technician or manager clears it).`
            : 'a technician or manager of the farm.'}
        </dd>
      </div>
    </dl>
  );
}
