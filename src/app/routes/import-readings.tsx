import { Link } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { Card, Section } from '../../components/ui/card';
import { Icon } from '../../components/ui/icons';
import { PageHeader } from '../../components/ui/page-header';
import { ImportFormatHelp } from '../../features/readings/components/import-format-help';
import { ImportReadingsForm } from '../../features/readings/components/import-readings-form';
import { useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

export function ImportReadingsPage() {
  const { membership } = useCurrentMembership();
  const { organization, role } = membership;

  if (role !== 'manager' && role !== 'technician') {
    return (
      <ForbiddenState
        role={role}
        pageName="Importing readings"
        allowedRoles="managers and technicians"
      />
    );
  }

  return (
    <>
      <PageHeader
        title="Import readings"
        description="Load many hour-meter readings at once from a spreadsheet saved as CSV."
      />
      <p className="-mt-3 mb-6">
        <Link
          to={paths.organization.logHours.href(organization.id)}
          className="inline-flex min-h-touch items-center gap-1 font-bold text-field-800 underline underline-offset-2"
        >
          <Icon name="back" className="size-4" />
          Back to Log hours
        </Link>
      </p>
      <div className="flex flex-col gap-8">
        <Section title="The file">
          <Card>
            <ImportFormatHelp units={organization.units} timeZone={organization.timeZone} />
          </Card>
        </Section>
        <Section
          title="Check and import"
          description="Checking reads every row and writes nothing. Import when every row is fine."
        >
          <Card>
            <ImportReadingsForm orgId={organization.id} timeZone={organization.timeZone} />
          </Card>
        </Section>
      </div>
    </>
  );
}
