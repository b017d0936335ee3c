import { Link } from 'react-router-dom';
import { buttonClasses } from '../../../components/ui/button';
import { Icon } from '../../../components/ui/icons';
import { useFarmContacts } from '../api/get-farm-contacts';
import { nameList } from './tag-out-explanation';

/**
 * A scanned label of a machine this operator may not walk round: assigned to other operators
 * (the server's message says which), or not one of this farm's. Says whom to ask, by name.
 */
export function NotYoursNotice({
  orgId,
  message,
  pickHref,
}: {
  orgId: string;
  /** the server's words when the machine is assigned to others; null: no such machine here */
  message: string | null;
  pickHref: string;
}) {
  const contacts = useFarmContacts(orgId);
  const managers = contacts.data?.managers ?? [];
  const ask = managers.length
    ? `Ask ${nameList(managers)} (${managers.length === 1 ? 'the manager' : 'the managers'})`
    : 'Ask a manager of the farm';
  return (
    <div className="flex flex-col gap-5">
      <div
        role="alert"
        className="flex gap-3 rounded-xl border-2 border-straw-500 bg-straw-50 p-5 text-straw-900"
      >
        <Icon name="lock" className="mt-1 size-7 shrink-0 text-straw-700" />
        <div className="flex flex-col gap-1">
          <p className="text-xl font-black">
            {message ? 'Not assigned to you' : 'Not a machine on your list'}
          </p>
          <p className="text-lg">
            {message
              ? `${message}.`
              : 'This label is not for a machine you may walk round on this farm.'}
          </p>
          <p className="text-lg font-bold">
            {ask} {message ? 'to assign it to you' : 'which machine to use'} before you use it.
          </p>
        </div>
      </div>
      <Link to={pickHref} className={buttonClasses('primary', 'min-h-12')}>
        Pick one of your machines
      </Link>
    </div>
  );
}
