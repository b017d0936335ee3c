import type { ReactNode } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { Card, Section } from '../../components/ui/card';
import { ErrorState } from '../../components/ui/error-state';
import { PageHeader } from '../../components/ui/page-header';
import { PageSkeleton } from '../../components/ui/skeleton';
import {
  calendarFeedsQueryOptions,
  useCalendarFeeds,
} from '../../features/notifications/api/get-calendar-feeds';
import {
  preferencesQueryOptions,
  usePreferences,
} from '../../features/notifications/api/get-preferences';
import { CalendarFeedCard } from '../../features/notifications/components/calendar-feed-card';
import { DigestHourForm } from '../../features/notifications/components/digest-hour-form';
import { DigestPreferencesForm } from '../../features/notifications/components/digest-preferences-form';
import { isApiError } from '../../lib/api-client';
import { useCurrentMembership } from '../../lib/auth';

export const notificationSettingsLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const orgId = params.orgId ?? '';
    void queryClient.prefetchQuery(preferencesQueryOptions(orgId));
    void queryClient.prefetchQuery(calendarFeedsQueryOptions(orgId));
    return null;
  };

/** "Reminders": the person's own digest and calendar feed; a manager also the farm's. */
export function NotificationSettingsPage() {
  const { membership } = useCurrentMembership();
  const { organization } = membership;
  const preferences = usePreferences(organization.id);
  const feeds = useCalendarFeeds(organization.id);

  if (
    organization.kind !== 'farm' ||
    (isApiError(preferences.error) && preferences.error.status === 403)
  ) {
    return (
      <ForbiddenState
        role={membership.role}
        pageName="Reminders"
        allowedRoles="the people of a farm"
      />
    );
  }

  const header = (
    <PageHeader
      title="Reminders"
      description={`What Hourstone e-mails you about ${organization.name}, and a calendar of its service dates.`}
    />
  );
  if (preferences.isPending) {
    return (
      <>
        {header}
        <PageSkeleton label="Loading your reminders" />
      </>
    );
  }
  if (preferences.isError) {
    return (
      <>
        {header}
        <ErrorState
          title="Your reminders didn't load"
          message={preferences.error.message}
          onRetry={() => preferences.refetch()}
          retrying={preferences.isRefetching}
        />
      </>
    );
  }

  const { meta, abilities } = preferences.data;
  const feedBlock = (render: (data: NonNullable<typeof feeds.data>) => ReactNode) =>
    feeds.isPending ? (
      <PageSkeleton label="Loading the calendar feed" />
    ) : feeds.isError ? (
      <ErrorState
        title="The calendar feed didn't load"
        message={feeds.error.message}
        onRetry={() => feeds.refetch()}
        retrying={feeds.isRefetching}
      />
    ) : (
      render(feeds.data)
    );

  return (
    <>
      {header}
      <div className="flex flex-col gap-8">
        <Section title="Due list by e-mail">
          <Card>
            <DigestPreferencesForm
              // a new server answer (after saving) starts the form from it
              key={JSON.stringify(preferences.data.data)}
              orgId={organization.id}
              preferences={preferences.data}
            />
          </Card>
        </Section>

        <Section
          title="Your calendar"
          description="Service dates of your machines in your own calendar app, updated as readings come in."
        >
          {feedBlock((data) => (
            <CalendarFeedCard
              orgId={organization.id}
              scope="personal"
              title="Your feed"
              feed={data.personal}
              timeZone={organization.timeZone}
              description="One all-day event per task on the date it falls due, for the machines in your due list (and only those you chose above)."
            />
          ))}
        </Section>

        {abilities.setDigestHour || abilities.manageFarmFeed ? (
          <Section title="For the whole farm" description="Only managers see these settings.">
            {abilities.setDigestHour ? (
              <Card>
                <DigestHourForm
                  key={meta.digestHour}
                  orgId={organization.id}
                  digestHour={meta.digestHour}
                  timeZone={meta.timeZone}
                />
              </Card>
            ) : null}
            {abilities.manageFarmFeed
              ? feedBlock((data) => (
                  <CalendarFeedCard
                    orgId={organization.id}
                    scope="farm"
                    title="Farm calendar"
                    feed={data.farm}
                    timeZone={organization.timeZone}
                    description="Every machine's service dates, for a shared shop or office calendar."
                  />
                ))
              : null}
          </Section>
        ) : null}
      </div>
    </>
  );
}
