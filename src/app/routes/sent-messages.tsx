import type { QueryClient } from '@tanstack/react-query';
import { useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { PageHeader } from '../../components/ui/page-header';
import { messagesQueryOptions, useMessages } from '../../features/notifications/api/get-messages';
import { messageQueryOptions } from '../../features/notifications/api/get-message';
import type { MessageFilters } from '../../features/notifications/api/types';
import { MessageList } from '../../features/notifications/components/message-list';
import { MessageViewer } from '../../features/notifications/components/message-viewer';
import { isApiError } from '../../lib/api-client';
import { useCurrentMembership } from '../../lib/auth';
import {
  NOTIFICATION_STATUSES,
  type NotificationStatusName,
} from '../../../shared/schemas/notifications';
import { paths } from '../paths';

function filtersFrom(search: URLSearchParams): MessageFilters {
  const status = search.get('status');
  const page = Number(search.get('page') ?? '1');
  return {
    status: (NOTIFICATION_STATUSES as readonly string[]).includes(status ?? '')
      ? (status as NotificationStatusName)
      : undefined,
    page: Number.isInteger(page) && page > 0 ? page : 1,
  };
}

export const sentMessagesLoader =
  (queryClient: QueryClient) =>
  ({ params, request }: LoaderFunctionArgs) => {
    const orgId = params.orgId ?? '';
    if (params.messageId)
      void queryClient.prefetchQuery(messageQueryOptions(orgId, params.messageId));
    else
      void queryClient.prefetchQuery(
        messagesQueryOptions(orgId, filtersFrom(new URL(request.url).searchParams)),
      );
    return null;
  };

/** "Sent messages": a manager's view of the outbox, and one message's content. */
export function SentMessagesPage() {
  const { membership } = useCurrentMembership();
  const { organization } = membership;
  const { messageId } = useParams();
  const [search, setSearch] = useSearchParams();
  const filters = filtersFrom(search);
  // the list query tells whether the role may see the outbox at all
  const probe = useMessages(organization.id, filters, {
    enabled: membership.role === 'manager',
  });

  if (membership.role !== 'manager' || (isApiError(probe.error) && probe.error.status === 403)) {
    return <ForbiddenState role={membership.role} pageName="Sent messages" />;
  }

  const listHref = paths.organization.messages.href(organization.id);
  return (
    <>
      <PageHeader
        title="Sent messages"
        description={`Every e-mail Hourstone wrote for ${organization.name}: due lists, log-hours reminders, overdue alerts and invitations, with what happened when it was sent.`}
      />
      {messageId ? (
        <MessageViewer
          orgId={organization.id}
          messageId={messageId}
          timeZone={organization.timeZone}
          backHref={`${listHref}${search.size ? `?${search}` : ''}`}
        />
      ) : (
        <MessageList
          orgId={organization.id}
          timeZone={organization.timeZone}
          filters={filters}
          onFiltersChange={(next) => {
            const params = new URLSearchParams();
            if (next.status) params.set('status', next.status);
            if (next.page > 1) params.set('page', String(next.page));
            setSearch(params);
          }}
          messageHref={(id) =>
            `${paths.organization.message.href(organization.id, id)}${search.size ? `?${search}` : ''}`
          }
        />
      )}
    </>
  );
}
