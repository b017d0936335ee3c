import type { QueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { Alert } from '../../components/ui/alert';
import { buttonClasses } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingRegion, Skeleton } from '../../components/ui/skeleton';
import { invitationQueryOptions, useInvitation } from '../../features/auth/api/get-invitation';
import { AcceptInvitationForm } from '../../features/auth/components/accept-invitation-form';
import { isApiError } from '../../lib/api-client';
import { rememberOrganization } from '../../lib/auth';
import { roleLabel } from '../../lib/format';
import { paths } from '../paths';

// Start the lookup with the navigation; the page shows its skeleton until it answers.
export const acceptInvitationLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(invitationQueryOptions(params.token ?? ''));
    return null;
  };

export function AcceptInvitationPage() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const invitation = useInvitation(token);

  if (invitation.isPending) {
    return (
      <AuthLayout title="Join your team">
        <LoadingRegion label="Loading invitation">
          <div className="flex flex-col gap-4">
            <Skeleton className="h-14 w-full" />
            <Skeleton className="h-11 w-full" />
            <Skeleton className="h-11 w-full" />
            <Skeleton className="h-11 w-full" />
          </div>
        </LoadingRegion>
      </AuthLayout>
    );
  }

  if (invitation.isError) {
    const gone = isApiError(invitation.error) && invitation.error.status === 404;
    return (
      <AuthLayout title={gone ? "This invitation can't be used" : 'Join your team'}>
        {gone ? (
          <div className="flex flex-col gap-4">
            <Alert tone="warning">
              The link has expired, was already used, or the invitation was withdrawn. Ask the
              person who invited you to send a new one.
            </Alert>
            <Link to={paths.signIn.href()} className={buttonClasses('secondary')}>
              I already have an account
            </Link>
          </div>
        ) : (
          <ErrorState
            message={invitation.error.message}
            onRetry={() => invitation.refetch()}
            retrying={invitation.isRefetching}
          />
        )}
      </AuthLayout>
    );
  }

  const { organization, role } = invitation.data;
  return (
    <AuthLayout
      title={`Join ${organization.name}`}
      description={
        <p>
          You've been invited to join as <strong>{roleLabel(role)}</strong>. Choose a password to
          finish.
        </p>
      }
    >
      <AcceptInvitationForm
        token={token}
        invitation={invitation.data}
        onAccepted={() => {
          rememberOrganization(organization.id);
          navigate(paths.organization.dashboard.href(organization.id), { replace: true });
        }}
      />
    </AuthLayout>
  );
}
