import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { Card, Section } from '../../components/ui/card';
import { ErrorState } from '../../components/ui/error-state';
import { PageHeader } from '../../components/ui/page-header';
import { PageSkeleton } from '../../components/ui/skeleton';
import {
  organizationQueryOptions,
  useOrganization,
  useUpdateOrganization,
} from '../../features/settings/api/organization';
import { DeleteOrganizationCard } from '../../features/settings/components/delete-organization-card';
import { FarmExportCard } from '../../features/settings/components/farm-export-card';
import { ApiKeysCard } from '../../features/settings/components/api-keys-card';
import {
  formValuesOf,
  OrganizationForm,
} from '../../features/settings/components/organization-form';
import { useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

export const organizationSettingsLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(organizationQueryOptions(params.orgId ?? ''));
    return null;
  };

/** The organization's settings (its manager changes them) and, at the end, deleting it. */
export function OrganizationSettingsPage() {
  const { membership } = useCurrentMembership();
  const orgId = membership.organization.id;
  const settings = useOrganization(orgId);
  const update = useUpdateOrganization(orgId);
  const navigate = useNavigate();

  if (settings.isPending) return <PageSkeleton label="Loading settings" />;
  if (settings.isError)
    return (
      <ErrorState
        title="The settings didn't load"
        message={settings.error.message}
        onRetry={() => settings.refetch()}
        retrying={settings.isRefetching}
      />
    );

  const { data, abilities } = settings.data;
  return (
    <>
      <PageHeader
        title="Settings"
        description={
          abilities.update
            ? `How ${data.name} keeps time, money and its season.`
            : `How ${data.name} is set up. Only its ${data.kind === 'farm' ? 'manager' : 'advisor'} can change this.`
        }
      />
      <div className="flex flex-col gap-8">
        <Card>
          <OrganizationForm
            mode="edit"
            submitLabel="Save settings"
            readOnly={!abilities.update}
            initial={formValuesOf(data)}
            onUpdate={(input) => update.mutateAsync(input)}
          />
        </Card>
        {abilities.export ? (
          <Section
            title="Your farm’s data"
            description="Everything the farm keeps here is the farm’s: download a copy at any time."
          >
            <FarmExportCard orgId={orgId} />
          </Section>
        ) : null}
        {abilities.update && data.kind === 'farm' ? (
          <Section
            title="API keys for machine data"
            description="Let a telematics feed send engine hours without anyone typing them."
          >
            <ApiKeysCard orgId={orgId} timeZone={data.timeZone} />
          </Section>
        ) : null}
        {abilities.delete ? (
          <Section
            title={`Delete ${data.kind === 'farm' ? 'the farm' : 'the dealer'}`}
            description="This cannot be undone."
          >
            <DeleteOrganizationCard
              orgId={orgId}
              name={data.name}
              kind={data.kind}
              canExport={abilities.export}
              onDeleted={() => navigate(paths.home.href(), { replace: true })}
            />
          </Section>
        ) : null}
      </div>
    </>
  );
}
