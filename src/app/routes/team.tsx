import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { Alert } from '../../components/ui/alert';
import { Card, Section } from '../../components/ui/card';
import { ErrorState } from '../../components/ui/error-state';
import { PageHeader } from '../../components/ui/page-header';
import { ListSkeleton } from '../../components/ui/skeleton';
import { membersQueryOptions, useMembers } from '../../features/settings/api/get-members';
import { InvitationList } from '../../features/settings/components/invitation-list';
import { InviteForm } from '../../features/settings/components/invite-form';
import { MemberList } from '../../features/settings/components/member-list';
import { roleOptionsFor } from '../../features/settings/components/role-options';
import { isApiError } from '../../lib/api-client';
import { useCurrentMembership } from '../../lib/auth';

export const teamLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(membersQueryOptions(params.orgId ?? ''));
    return null;
  };

export function TeamPage() {
  const { me, membership } = useCurrentMembership();
  const { organization } = membership;
  const members = useMembers(organization.id);
  const roleOptions = roleOptionsFor(organization.kind);

  if (members.isError && isApiError(members.error) && members.error.status === 403) {
    return <ForbiddenState role={membership.role} pageName="The team page" />;
  }

  const canInvite = members.data?.abilities.invite ?? false;

  return (
    <>
      <PageHeader
        title="Team"
        description={`The people at ${organization.name} and their roles.`}
      />
      <div className="flex flex-col gap-8">
        <Section title="Members">
          {members.isPending ? (
            <ListSkeleton rows={4} label="Loading members" />
          ) : members.isError ? (
            <ErrorState
              title="The team didn't load"
              message={members.error.message}
              onRetry={() => members.refetch()}
              retrying={members.isRefetching}
            />
          ) : (
            <MemberList
              orgId={organization.id}
              organizationName={organization.name}
              members={members.data.data}
              currentUserId={me.user.id}
              roleOptions={roleOptions}
            />
          )}
        </Section>

        {canInvite ? (
          <>
            <Section
              title="Invite someone"
              description="They get an e-mail with a link to choose a password and join."
            >
              <Card>
                <InviteForm orgId={organization.id} roleOptions={roleOptions} />
              </Card>
            </Section>
            <Section title="Pending invitations">
              <InvitationList orgId={organization.id} timeZone={organization.timeZone} />
            </Section>
          </>
        ) : members.isSuccess ? (
          <Alert tone="info">Only a manager can invite people or change roles.</Alert>
        ) : null}
      </div>
    </>
  );
}
