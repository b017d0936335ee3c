import type { QueryClient } from '@tanstack/react-query';
import {
  data,
  Navigate,
  Outlet,
  useNavigate,
  useParams,
  type LoaderFunctionArgs,
} from 'react-router-dom';
import { AppShell } from '../../components/layouts/app-shell';
import { OrganizationSwitcher } from '../../components/layouts/organization-switcher';
import { NotFound } from '../../components/errors/route-error';
import {
  CurrentMembershipProvider,
  findMembership,
  rememberOrganization,
  useMe,
} from '../../lib/auth';
import { membershipLabel } from '../../lib/format';
import { requireMe } from '../guards';
import { navigationByRole } from '../navigation';
import { paths } from '../paths';

// The switcher's last choice opens the form for another organization.
const NEW_ORGANIZATION = 'new';

/** Every /o/:orgId page: signed in, and a member of that organization (else 404, not 403). */
export const organizationLoader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    const me = await requireMe(queryClient, request);
    const orgId = params.orgId ?? '';
    const membership = findMembership(me, orgId);
    if (!membership) throw data(null, { status: 404 });
    rememberOrganization(orgId, membership.organization.kind);
    return null;
  };

export function OrganizationLayout() {
  const { orgId = '' } = useParams();
  const navigate = useNavigate();
  // Read the session from the query (not the loader) so a role change shows up at once.
  const { data: me } = useMe();

  if (me === null) return <Navigate to={paths.signIn.href()} replace />;
  if (!me) return null; // the loader guarantees the session; this is only the type narrowing
  const membership = findMembership(me, orgId);
  if (!membership) return <NotFound homeHref={paths.home.href()} />;

  const navItems = navigationByRole[membership.role].map((item) => ({
    label: item.label,
    href: item.to(orgId),
    icon: item.icon,
    end: item.end,
  }));

  return (
    <CurrentMembershipProvider value={{ me, membership }}>
      <AppShell
        homeHref={paths.organization.dashboard.href(orgId)}
        navItems={navItems}
        headerEnd={
          <OrganizationSwitcher
            value={orgId}
            options={[
              ...me.memberships.map((m) => ({
                value: m.organization.id,
                label: membershipLabel(m),
              })),
              { value: NEW_ORGANIZATION, label: 'New farm or dealer…' },
            ]}
            onChange={(nextId) =>
              navigate(
                nextId === NEW_ORGANIZATION
                  ? paths.organizationNew.href()
                  : paths.organization.dashboard.href(nextId),
              )
            }
          />
        }
      >
        <Outlet />
      </AppShell>
    </CurrentMembershipProvider>
  );
}
