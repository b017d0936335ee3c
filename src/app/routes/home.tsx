import type { QueryClient } from '@tanstack/react-query';
import { Link, redirect, useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { FullPageMessage } from '../../components/errors/full-page-message';
import { Button, buttonClasses } from '../../components/ui/button';
import { homeStart, useMe, useSignOut } from '../../lib/auth';
import { requireMe } from '../guards';
import { homeHref, paths } from '../paths';

/** `/`: straight to the organization last used here, else the first one. */
export const homeLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await requireMe(queryClient, request);
    const [orgId, role] = homeStart(me);
    if (orgId) throw redirect(homeHref(orgId, role));
    return null;
  };

/** Reached only by someone signed in who belongs to no organization (removed, or not yet added). */
export function HomePage() {
  const { data: me } = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();
  return (
    <FullPageMessage
      icon="team"
      title="You're not in an organization yet"
      actions={
        <>
          <Link to={paths.organizationNew.href()} className={buttonClasses('primary')}>
            Set up a farm or dealer
          </Link>
          <Button
            variant="secondary"
            icon="signOut"
            pending={signOut.isPending}
            onClick={() =>
              signOut.mutate(undefined, {
                onSettled: () => navigate(paths.signIn.href(), { replace: true }),
              })
            }
          >
            Sign out
          </Button>
        </>
      }
    >
      <p>
        You're signed in{me ? ` as ${me.user.email}` : ''}, but no farm or dealer has added you. Set
        up your own, or ask a manager to send you an invitation; the link in it brings you straight
        in.
      </p>
    </FullPageMessage>
  );
}
