import { Link, useNavigate } from 'react-router-dom';
import { Alert } from '../../components/ui/alert';
import { Card } from '../../components/ui/card';
import { Icon } from '../../components/ui/icons';
import { PageHeader } from '../../components/ui/page-header';
import { useCreateMachine } from '../../features/machines/api/create-machine';
import { MachineForm } from '../../features/machines/components/machine-form';
import { useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

export function MachineNewPage() {
  const { membership } = useCurrentMembership();
  const { organization } = membership;
  const navigate = useNavigate();
  const create = useCreateMachine(organization.id);
  const fleetHref = paths.organization.machines.href(organization.id);

  return (
    <>
      <Link
        to={fleetHref}
        className="mb-3 inline-flex min-h-touch items-center gap-1 font-bold text-field-700 hover:text-field-950"
      >
        <Icon name="back" />
        Fleet
      </Link>
      <PageHeader
        title="Add machine"
        description="A new machine for the fleet. Its service schedule and readings come next."
      />
      {membership.role !== 'manager' ? (
        <Alert tone="info">Only a manager can add machines.</Alert>
      ) : (
        <Card>
          <MachineForm
            orgId={organization.id}
            submitLabel="Add machine"
            onSubmit={async (values) => {
              const machine = await create.mutateAsync(values);
              navigate(paths.organization.machine.href(organization.id, machine.id));
            }}
            onCancel={() => navigate(fleetHref)}
          />
        </Card>
      )}
    </>
  );
}
