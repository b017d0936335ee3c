import { OutlookSection } from '../../../components/outlook/outlook-section';
import type { OutlookLinks } from '../../../components/outlook/outlook-weeks';
import { useShopOutlook } from '../api/get-shop-outlook';

const WEEKS = 16;

/** The shop week's look ahead: the next 16 weeks of forecast work beside what is planned. */
export function ShopOutlookSection({ orgId, links }: { orgId: string; links?: OutlookLinks }) {
  return (
    <OutlookSection
      title={`Next ${WEEKS} weeks`}
      description="Labour the forecast brings due each week (overdue work in this week), beside the visits already planned. Open a week for its services and parts."
      outlook={useShopOutlook(orgId, WEEKS)}
      links={links}
    />
  );
}
