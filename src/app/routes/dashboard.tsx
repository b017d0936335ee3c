import { EmptyState } from '../../components/ui/empty-state';
import { PageHeader } from '../../components/ui/page-header';
import { useCurrentMembership } from '../../lib/auth';

export function DashboardPage() {
  const { membership } = useCurrentMembership();
  const { organization } = membership;
  return (
    <>
      <PageHeader
        title="Dashboard"
        description={<p className="text-lg font-bold">{organization.name}</p>}
      />
      <EmptyState icon="gauge" title="Nothing due yet">
        <p>
          The due list arrives with the fleet. Once machines and their hour-meter readings are in,
          this page shows what is overdue, what is coming due and when.
        </p>
      </EmptyState>
    </>
  );
}
