import type { UseQueryResult } from '@tanstack/react-query';
import type { ShopOutlook } from '../../../shared/schemas/shop-outlook';
import { Section } from '../ui/card';
import { ErrorState } from '../ui/error-state';
import { ListSkeleton } from '../ui/skeleton';
import { OutlookWeeks, type OutlookLinks } from './outlook-weeks';

/** A titled "next weeks" block with its loading and error states, for the farm's and dealer's pages. */
export function OutlookSection({
  title,
  description,
  outlook,
  links,
}: {
  title: string;
  description: string;
  outlook: UseQueryResult<ShopOutlook>;
  links?: OutlookLinks;
}) {
  return (
    <Section title={title} description={description}>
      {outlook.isPending ? (
        <ListSkeleton rows={4} label="Loading the next weeks" />
      ) : outlook.isError ? (
        <ErrorState
          title="The next weeks didn't load"
          message={outlook.error.message}
          onRetry={() => outlook.refetch()}
          retrying={outlook.isRefetching}
        />
      ) : (
        <OutlookWeeks outlook={outlook.data} links={links} />
      )}
    </Section>
  );
}
