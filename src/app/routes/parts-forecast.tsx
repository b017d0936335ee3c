import { useSearchParams } from 'react-router-dom';
import { DUE_HORIZONS } from '../../../shared/constants';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { PageHeader } from '../../components/ui/page-header';
import { PartsForecastView } from '../../features/dealers/components/parts-forecast-view';
import { useCurrentMembership } from '../../lib/auth';

export function PartsForecastPage() {
  const { membership } = useCurrentMembership();
  const [search, setSearch] = useSearchParams();
  if (membership.organization.kind !== 'dealer')
    return (
      <ForbiddenState
        role={membership.role}
        pageName="The parts forecast"
        allowedRoles="dealers' service advisors"
      />
    );
  const asked = Number(search.get('horizon'));
  const horizon = (DUE_HORIZONS as readonly number[]).includes(asked) ? asked : 30;
  const customerId = search.get('customer');
  return (
    <>
      <PageHeader
        title="Parts forecast"
        description="Parts and fluids your customers' due services call for, to stock the counter."
      />
      <PartsForecastView
        orgId={membership.organization.id}
        horizon={horizon}
        customerId={customerId}
        onChange={(change) => {
          const next = new URLSearchParams(search);
          if (change.horizon !== undefined) next.set('horizon', String(change.horizon));
          if (change.customerId !== undefined) {
            if (change.customerId) next.set('customer', change.customerId);
            else next.delete('customer');
          }
          setSearch(next, { preventScrollReset: true });
        }}
      />
    </>
  );
}
