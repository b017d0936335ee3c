import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { useBookings } from '../api/get-bookings';

/**
 * On a farm's dashboard: how many dealer proposals wait for the farm's answer, with the way to
 * them. Nothing while none waits (or while the list loads: the dashboard is the due board's).
 */
export function WaitingProposals({ orgId, href }: { orgId: string; href: string }) {
  const bookings = useBookings(orgId);
  const waiting = (bookings.data?.data ?? []).filter((b) => b.status === 'proposed');
  if (!waiting.length) return null;
  const dealers = [...new Set(waiting.map((b) => b.dealer.name))];
  return (
    <Alert tone="info" title="Bookings waiting for an answer" className="mb-6">
      <p>
        {waiting.length === 1
          ? `${dealers[0]} proposed a service date.`
          : `${waiting.length} proposed service dates from ${dealers.join(', ')}.`}{' '}
        <Link className="font-bold underline" to={href}>
          {waiting.length === 1 ? 'Answer the proposal' : `Answer the ${waiting.length} proposals`}
        </Link>
      </p>
    </Alert>
  );
}
