import type { Organization } from '../models';
import type {
  OrganizationAbilities,
  OrganizationSettings,
} from '../../shared/schemas/organizations';
import type { OrgAccess } from '../policies/access';
import { canExportFarmData } from '../policies/farm-export';
import { canDeleteOrganization, canUpdateOrganization } from '../policies/organization';

export const presentOrganizationSettings = (o: Organization): OrganizationSettings => ({
  id: o.id,
  kind: o.kind,
  name: o.name,
  timeZone: o.timeZone,
  currency: o.currency,
  units: o.units,
  labourRateMinor: o.labourRateMinor,
  seasonMonths: [...o.seasonMonths].sort((a, b) => a - b),
  digestHour: o.digestHour,
});

export const organizationAbilities = (access: OrgAccess): OrganizationAbilities => ({
  update: canUpdateOrganization(access),
  delete: canDeleteOrganization(access),
  export: canExportFarmData(access),
});
