import { Link, useParams } from 'react-router-dom';
import { Brand } from '../../components/layouts/brand';
import { SkipLink } from '../../components/layouts/skip-link';
import { EmptyState } from '../../components/ui/empty-state';
import { ErrorState } from '../../components/ui/error-state';
import { ListSkeleton } from '../../components/ui/skeleton';
import { useMail } from '../../features/dev-mail/api/get-mail';
import { MailList } from '../../features/dev-mail/components/mail-list';
import { MailViewer } from '../../features/dev-mail/components/mail-viewer';
import { isApiError } from '../../lib/api-client';
import { paths } from '../paths';

/** Development only: the mail the app sent, caught locally, so its links can be followed. */
export function DevMailPage() {
  const { messageId } = useParams();
  const mail = useMail();
  const selected = mail.data?.find((message) => message.id === messageId);

  return (
    <div className="min-h-dvh">
      <title>Caught mail · Hourstone</title>
      <SkipLink />
      <header className="flex items-center gap-3 border-b border-field-200 px-4 py-3 sm:px-6">
        <Link to={paths.home.href()} className="flex min-h-touch items-center rounded-lg">
          <Brand />
        </Link>
        <span className="rounded-full bg-straw-200 px-2.5 py-0.5 text-sm font-bold text-straw-900">
          Development
        </span>
      </header>
      <main
        id="main"
        tabIndex={-1}
        className="mx-auto max-w-6xl px-4 py-6 focus:outline-none sm:px-6"
      >
        <h1 className="text-2xl font-black text-field-950">Caught mail</h1>
        <p className="mt-1 text-field-700">
          Every e-mail the app sent here, newest first. Nothing on this page leaves this machine.
        </p>
        <div className="mt-6">
          {mail.isPending ? (
            <ListSkeleton rows={3} label="Loading mail" />
          ) : mail.isError ? (
            isApiError(mail.error) && mail.error.status === 404 ? (
              <EmptyState icon="mail" title="Caught mail is off">
                This page works only when the server runs in development with the local mail
                catcher.
              </EmptyState>
            ) : (
              <ErrorState
                title="Mail didn't load"
                message={mail.error.message}
                onRetry={() => mail.refetch()}
                retrying={mail.isRefetching}
              />
            )
          ) : mail.data.length === 0 ? (
            <EmptyState icon="mail" title="No mail yet">
              Send an invitation or ask for a password reset; the message appears here within a few
              seconds.
            </EmptyState>
          ) : (
            <div className="grid gap-4 lg:grid-cols-[20rem_minmax(0,1fr)]">
              <div className={selected ? 'hidden lg:block' : undefined}>
                <MailList messages={mail.data} hrefFor={paths.devMail.message.href} />
              </div>
              {selected ? (
                <div className="flex flex-col gap-3">
                  <Link
                    to={paths.devMail.href()}
                    className="inline-flex min-h-touch items-center gap-1 self-start font-bold text-loam-700 underline underline-offset-4 lg:hidden"
                  >
                    All mail
                  </Link>
                  <MailViewer key={selected.id} message={selected} />
                </div>
              ) : messageId ? (
                <EmptyState icon="mail" title="That message is gone">
                  The mail catcher no longer has it. Pick another from the list.
                </EmptyState>
              ) : (
                <p className="hidden items-center justify-center rounded-xl border-2 border-dashed border-field-200 p-10 text-field-600 lg:flex">
                  Pick a message to read it.
                </p>
              )}
            </div>
          )}
        </div>
      </main>
    </div>
  );
}
