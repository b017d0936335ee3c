import { DEALER_ROLES, FARM_ROLES, type OrganizationKind } from '../../../../shared/constants';
import { roleLabel } from '../../../lib/format';

/** The roles a farm or a dealer can hand out, as select options. */
export const roleOptionsFor = (kind: OrganizationKind) =>
  (kind === 'farm' ? FARM_ROLES : DEALER_ROLES).map((role) => ({
    value: role,
    label: roleLabel(role),
  }));
