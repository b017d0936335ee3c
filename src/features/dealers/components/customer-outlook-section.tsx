import { OutlookSection } from '../../../components/outlook/outlook-section';
import type { OutlookLinks } from '../../../components/outlook/outlook-weeks';
import { useCustomerOutlook } from '../api/get-customer-outlook';

const WEEKS = 16;

/** The dealer's look ahead across its customers: the workshop capacity the next weeks need. */
export function CustomerOutlookSection({ orgId, links }: { orgId: string; links?: OutlookLinks }) {
  return (
    <OutlookSection
      title={`Next ${WEEKS} weeks`}
      description="Labour your customers' forecasts bring due each week (overdue work in this week), beside the visits planned on farms that gave you service access. Open a week for its services and parts."
      outlook={useCustomerOutlook(orgId, WEEKS, null)}
      links={links}
    />
  );
}
