import type { QueryClient } from '@tanstack/react-query';
import { Link, useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { useCreateOrganization } from '../../features/settings/api/organization';
import { OrganizationForm } from '../../features/settings/components/organization-form';
import { browserTimeZone, browserUnits } from '../../features/settings/lib/organization-options';
import { useMe } from '../../lib/auth';
import { requireMe } from '../guards';
import { paths } from '../paths';

export const organizationNewLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireMe(queryClient, request);
    return null;
  };

/** A new farm or dealer, run by the person who creates it; its time zone preset from here. */
export function OrganizationNewPage() {
  const navigate = useNavigate();
  const { data: me } = useMe();
  const create = useCreateOrganization();
  const first = !me?.memberships.length;

  return (
    <AuthLayout
      title={first ? 'Set up your farm or dealer' : 'New organization'}
      description="You can change all of this later in Settings."
      footer={
        first ? null : (
          <Link
            to={paths.home.href()}
            className="inline-flex min-h-touch items-center font-bold underline underline-offset-4"
          >
            Back
          </Link>
        )
      }
    >
      <OrganizationForm
        mode="create"
        submitLabel="Create"
        initial={{
          kind: 'farm',
          name: '',
          timeZone: browserTimeZone(),
          currency: 'USD',
          units: browserUnits(),
          labourRate: '',
          seasonMonths: [],
          digestHour: '6',
        }}
        onCreate={async (input) => {
          const created = await create.mutateAsync(input);
          navigate(paths.organization.dashboard.href(created.data.id));
        }}
      />
    </AuthLayout>
  );
}
