import { useEffect, useState, type ReactNode } from 'react';
import type { UnitSystem } from '../../../../shared/constants';
import type { WalkaroundPurpose } from '../../../../shared/schemas/walkarounds';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { RestrictionNotice } from '../../../components/ui/restriction-notice';
import { PageSkeleton } from '../../../components/ui/skeleton';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { useChecklist } from '../api/get-checklist';
import { usePickableMachines } from '../api/get-pickable-machines';
import type { Checklist } from '../api/types';
import { useOutbox } from '../../../lib/outbox/use-outbox';
import { queuedWalkarounds } from '../lib/queued-walkarounds';
import { useSendWalkaround, type SendResult } from '../lib/use-send-walkaround';
import { useWalkaroundDraft } from '../lib/use-walkaround-draft';
import { QueuedWalkaround } from './queued-walkaround';
import { NotYoursNotice } from './not-yours-notice';
import { TaggedOutNotice } from './tagged-out-notice';
import { WalkaroundForm } from './walkaround-form';
import { WalkaroundOutcomeView } from './walkaround-outcome';

export interface WalkaroundHrefs {
  pick: string;
  defects: string;
  /** the same machine's shop inspection (null: not offered) */
  inspect: string | null;
}

interface WalkaroundScreenProps {
  orgId: string;
  machineId: string;
  purpose: WalkaroundPurpose;
  userId: string;
  units: UnitSystem;
  timeZone: string;
  hrefs: WalkaroundHrefs;
  /**
   * What the page shows above the checklist for this machine, online only (e.g. a tractor's
   * hitched implement, from the hitch log): the page composes it, as features stay apart.
   */
  machineExtras?: (machine: Checklist['machine']) => ReactNode;
}

const isUnreachable = (error: unknown) => isApiError(error) && error.code === 'unreachable';

/**
 * One machine's walkaround, from the checklist to the server's answer. The checklist comes from
 * the server, or from the draft on the phone when the connection is gone.
 */
export function WalkaroundScreen(props: WalkaroundScreenProps) {
  const { orgId, machineId, purpose, hrefs } = props;
  const [result, setResult] = useState<SendResult | null>(null);
  const query = useChecklist(orgId, machineId, purpose, !result);
  const draftApi = useWalkaroundDraft(orgId, machineId, purpose);
  const { update } = draftApi;

  // The answer replaces a long form: show it from the top, where the heading is.
  useEffect(() => {
    if (result) window.scrollTo({ top: 0 });
  }, [result]);

  // Keep the checklist with the draft, for carrying on without a connection.
  const loaded = query.data?.data;
  useEffect(() => {
    if (!loaded || result) return;
    update((d) =>
      JSON.stringify(d.checklist) === JSON.stringify(loaded) ? d : { ...d, checklist: loaded },
    );
  }, [loaded, result, update]);

  const offlineChecklist = isUnreachable(query.error) ? draftApi.draft.checklist : null;
  const checklist = loaded ?? offlineChecklist;
  const taggedOut =
    isApiError(query.error) && query.error.code === 'tagged_out' ? query.error.message : null;
  // a label this person may not use: assigned to other operators, or not this farm's machine
  const notYours =
    isApiError(query.error) && query.error.status === 404
      ? { message: query.error.code === 'not_assigned' ? query.error.message : null }
      : null;
  const machines = usePickableMachines(orgId);
  const fleetNumber =
    checklist?.machine.fleetNumber ??
    machines.data?.find((machine) => machine.id === machineId)?.fleetNumber;
  const title = `${purpose === 'inspection' ? 'Shop inspection' : 'Walkaround'}${fleetNumber ? ` · ${fleetNumber}` : ''}`;

  let body;
  if (result?.kind === 'sent') {
    body = (
      <WalkaroundOutcomeView
        outcome={result.outcome}
        pickHref={hrefs.pick}
        defectsHref={hrefs.defects}
      />
    );
  } else if (result?.kind === 'queued') {
    body = (
      <QueuedWalkaround
        clientId={result.clientId}
        fleetNumber={fleetNumber ?? 'this machine'}
        photosWaiting={result.photosWaiting}
        pickHref={hrefs.pick}
        defectsHref={hrefs.defects}
        onDiscarded={() => {
          draftApi.startOver();
          setResult(null);
        }}
      />
    );
  } else if (checklist) {
    body = (
      <ReadyScreen
        {...props}
        checklist={checklist}
        offline={!loaded}
        draftApi={draftApi}
        onSent={setResult}
      />
    );
  } else if (taggedOut) {
    body = (
      <TaggedOutNotice
        orgId={orgId}
        machineId={machineId}
        timeZone={props.timeZone}
        message={taggedOut}
        pickHref={hrefs.pick}
        defectsHref={hrefs.defects}
        inspectHref={hrefs.inspect}
      />
    );
  } else if (notYours) {
    body = <NotYoursNotice orgId={orgId} message={notYours.message} pickHref={hrefs.pick} />;
  } else if (query.isError) {
    body = (
      <ErrorState
        title="The checklist didn't load"
        message={query.error.message}
        onRetry={() => query.refetch()}
        retrying={query.isRefetching}
      />
    );
  } else {
    body = <PageSkeleton label="Loading the checklist" />;
  }

  return (
    <>
      <PageHeader title={title} description={checklist ? checklist.machine.name : undefined} />
      {body}
    </>
  );
}

function ReadyScreen({
  orgId,
  userId,
  purpose,
  units,
  timeZone,
  checklist,
  offline,
  draftApi,
  onSent,
  machineExtras,
}: WalkaroundScreenProps & {
  checklist: Checklist;
  offline: boolean;
  draftApi: ReturnType<typeof useWalkaroundDraft>;
  onSent: (result: SendResult) => void;
}) {
  const { entries } = useOutbox();
  const waiting = queuedWalkarounds(entries).filter(
    (item) => item.input.machineId === checklist.machine.id && item.entry.userId === userId,
  );
  const send = useSendWalkaround({
    orgId,
    userId,
    machine: checklist.machine,
    onDone: draftApi.finish,
  });
  // a checklist kept on the phone before restrictions has none
  const restriction = checklist.machine.restriction ?? null;
  return (
    <div className="flex flex-col gap-4">
      {restriction ? (
        <RestrictionNotice
          fleetNumber={checklist.machine.fleetNumber}
          restriction={restriction}
          timeZone={timeZone}
        />
      ) : null}
      {offline ? (
        <p role="status" className="rounded-lg border-2 border-sky-300 bg-sky-50 p-3 text-sky-900">
          No connection: this is the checklist saved on this phone. Carry on; the walkaround is kept
          here and sent when the connection returns.
        </p>
      ) : null}
      {waiting.length > 0 ? (
        <p className="rounded-lg border border-sky-300 bg-sky-50 p-3 text-sky-900">
          {waiting.length === 1 ? 'A walkaround' : `${waiting.length} walkarounds`} of{' '}
          {checklist.machine.fleetNumber} from this phone {waiting.length === 1 ? 'is' : 'are'}{' '}
          still waiting to be sent (done{' '}
          {waiting
            .map((item) => formatDateTime(item.input.performedAt ?? item.entry.queuedAt, timeZone))
            .join(', ')}
          ). Start this one only for a new check.
        </p>
      ) : null}
      {!offline && machineExtras ? machineExtras(checklist.machine) : null}
      <WalkaroundForm
        orgId={orgId}
        checklist={checklist}
        purpose={purpose}
        units={units}
        timeZone={timeZone}
        draftApi={draftApi}
        send={send}
        onSent={onSent}
      />
    </div>
  );
}
