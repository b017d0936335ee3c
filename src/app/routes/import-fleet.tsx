import { Link } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { Card, Section } from '../../components/ui/card';
import { Icon } from '../../components/ui/icons';
import { PageHeader } from '../../components/ui/page-header';
import { fleetExampleHref } from '../../features/onboarding/api/fleet-import';
import { FleetFormatHelp } from '../../features/onboarding/components/fleet-format-help';
import { FleetImportForm } from '../../features/onboarding/components/fleet-import-form';
import { useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

export function ImportFleetPage() {
  const { membership } = useCurrentMembership();
  const { organization, role } = membership;
  const fleetHref = paths.organization.machines.href(organization.id);

  if (role !== 'manager' || organization.kind !== 'farm')
    return <ForbiddenState role={role} pageName="Importing the fleet" />;

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
        title="Import fleet"
        description="Bring many machines in at once from a spreadsheet saved as CSV, or update the ones you have."
      />
      <div className="flex flex-col gap-8">
        <Section title="The file">
          <Card>
            <FleetFormatHelp
              units={organization.units}
              timeZone={organization.timeZone}
              exampleHref={fleetExampleHref(organization.id)}
            />
          </Card>
        </Section>
        <Section
          title="Check and import"
          description="Checking reads every row and writes nothing. Import when every row is fine."
        >
          <Card>
            <FleetImportForm orgId={organization.id} fleetHref={fleetHref} />
          </Card>
        </Section>
      </div>
    </>
  );
}
