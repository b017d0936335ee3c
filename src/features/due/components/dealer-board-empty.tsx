import { EmptyState } from '../../../components/ui/empty-state';

/**
 * A dealer organization has no machines of its own: its due board lists the machines of the
 * farms that link to it, which arrives with dealer links.
 */
export function DealerBoardEmpty({ organizationName }: { organizationName: string }) {
  return (
    <EmptyState icon="gauge" title="The dealer board arrives with dealer links">
      <p>
        {organizationName} has no machines of its own. Once farms link their fleets to your
        dealership, the machines coming due across your customers will show here.
      </p>
    </EmptyState>
  );
}
