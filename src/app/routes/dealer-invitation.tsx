import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { Alert } from '../../components/ui/alert';
import { buttonClasses } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingRegion, Skeleton } from '../../components/ui/skeleton';
import { useDealerInvitation } from '../../features/dealers/api/get-dealer-invitation';
import { AcceptDealerInvitationForm } from '../../features/dealers/components/accept-invitation-form';
import { isApiError } from '../../lib/api-client';
import { requireMe } from '../guards';
import { paths } from '../paths';

/** The page a dealer's e-mailed link opens: signed in first (a farm manager answers it). */
export const dealerInvitationLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireMe(queryClient, request);
    return null;
  };

export function DealerInvitationPage() {
  const { token = '' } = useParams();
  const invitation = useDealerInvitation(token);
  const [accepted, setAccepted] = useState<{ dealer: string; farmId: string } | null>(null);
  const title = invitation.data
    ? `${invitation.data.dealer.name} asks for access`
    : 'A dealer asks for access';

  if (accepted)
    return (
      <AuthLayout title="Access given">
        <div className="flex flex-col gap-4">
          <Alert tone="success">{accepted.dealer} can now see your machines as you chose.</Alert>
          <Link
            className={buttonClasses('primary')}
            to={paths.organization.farmDealers.href(accepted.farmId)}
          >
            Open the Dealers page
          </Link>
        </div>
      </AuthLayout>
    );
  return (
    <AuthLayout title={title}>
      {invitation.isPending ? (
        <LoadingRegion label="Loading the request">
          <div className="flex flex-col gap-4">
            <Skeleton className="h-14 w-full" />
            <Skeleton className="h-24 w-full" />
          </div>
        </LoadingRegion>
      ) : invitation.isError ? (
        isApiError(invitation.error) && invitation.error.status === 404 ? (
          <Alert tone="warning">
            This link has expired, was withdrawn or was answered already. Ask the dealer to send a
            new one.
          </Alert>
        ) : (
          <ErrorState message={invitation.error.message} onRetry={() => invitation.refetch()} />
        )
      ) : (
        <div className="flex flex-col gap-4">
          <p className="text-field-700">
            {invitation.data.dealer.name} would like to see your farm&apos;s machines on Hourstone:
            what is coming due, so they can remind you and propose service dates.
          </p>
          {invitation.data.message ? (
            <blockquote className="border-l-4 border-field-300 pl-3 text-field-800">
              {invitation.data.message}
            </blockquote>
          ) : null}
          <AcceptDealerInvitationForm
            token={token}
            invitation={invitation.data}
            onAccepted={(_link, farmId) =>
              setAccepted({ dealer: invitation.data.dealer.name, farmId })
            }
          />
        </div>
      )}
    </AuthLayout>
  );
}
