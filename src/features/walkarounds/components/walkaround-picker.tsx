import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import { CATEGORY_LABELS } from '../../../../shared/constants';
import { Badge } from '../../../components/ui/badge';
import { RestrictedBadge } from '../../../components/ui/status-badges';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { TextField } from '../../../components/ui/field';
import { Icon } from '../../../components/ui/icons';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { formatMeter } from '../../../lib/fleet-format';
import { usePickableMachines } from '../api/get-pickable-machines';
import type { PickableMachine } from '../api/types';
import { loadDraft } from '../lib/draft';
import { OutboxPanel } from '../../../components/outbox/outbox-panel';
import { TagOutExplanation } from './tag-out-explanation';

/** Past this many machines the list gets a search box. */
const SEARCH_FROM = 8;

/**
 * The machines this person may walk round: the ones assigned to them first, then the rest, each
 * in fleet-number order. Tagged-out ones are listed (so nobody thinks they are missing) but are
 * not links: they must not be used; a tap says why, since when and whom to ask. A restricted one
 * is a link like any other, with its reason written on the card (never behind a hover).
 */
export function WalkaroundPicker({
  orgId,
  userId,
  timeZone,
  walkaroundHref,
  emptyHint,
}: {
  orgId: string;
  userId: string;
  timeZone: string;
  walkaroundHref: (machineId: string) => string;
  emptyHint: string;
}) {
  const machines = usePickableMachines(orgId);
  const [find, setFind] = useState('');

  if (machines.isPending) return <ListSkeleton rows={5} label="Loading machines" />;
  if (machines.isError)
    return (
      <ErrorState
        title="The machines didn't load"
        message={machines.error.message}
        onRetry={() => machines.refetch()}
        retrying={machines.isRefetching}
      />
    );

  const needle = find.trim().toLowerCase();
  const shown = needle
    ? machines.data.filter((m) => `${m.fleetNumber} ${m.name}`.toLowerCase().includes(needle))
    : machines.data;
  const mine = shown.filter((m) => m.operatorIds.includes(userId));
  const others = shown.filter((m) => !m.operatorIds.includes(userId));
  // one list without headings when nothing is assigned to this person
  const groups =
    mine.length === 0
      ? [{ title: null, machines: shown }]
      : [
          { title: 'Assigned to you', machines: mine },
          ...(others.length ? [{ title: 'Other machines', machines: others }] : []),
        ];

  return (
    <div className="flex flex-col gap-4">
      <OutboxPanel orgId={orgId} userId={userId} timeZone={timeZone} />
      {machines.data.length === 0 ? (
        <EmptyState icon="field" title="No machines to walk round">
          <p>{emptyHint}</p>
        </EmptyState>
      ) : (
        <>
          {machines.data.length >= SEARCH_FROM ? (
            <TextField
              label="Find machine"
              type="search"
              value={find}
              onChange={(event) => setFind(event.target.value)}
              placeholder="Fleet number or name"
            />
          ) : null}
          {groups.map((group) => (
            <section key={group.title ?? 'all'} className="flex flex-col gap-3">
              {group.title ? (
                <h2 className="text-base font-black text-field-800">{group.title}</h2>
              ) : null}
              <ul aria-label={group.title ?? 'Machines'} className="flex flex-col gap-3">
                {group.machines.map((machine) => (
                  <li key={machine.id}>
                    <MachineChoice
                      orgId={orgId}
                      timeZone={timeZone}
                      machine={machine}
                      href={walkaroundHref(machine.id)}
                      inProgress={inProgress(orgId, machine.id)}
                    />
                  </li>
                ))}
              </ul>
            </section>
          ))}
          {shown.length === 0 ? (
            <p className="text-field-700">No machine matches “{find.trim()}”.</p>
          ) : null}
        </>
      )}
    </div>
  );
}

const inProgress = (orgId: string, machineId: string) => {
  const draft = loadDraft(orgId, machineId, 'use');
  return !!draft && Object.values(draft.answers).some((answer) => answer.result);
};

function MachineChoice({
  orgId,
  timeZone,
  machine,
  href,
  inProgress,
}: {
  orgId: string;
  timeZone: string;
  machine: PickableMachine;
  href: string;
  inProgress: boolean;
}) {
  const [explained, setExplained] = useState(false);
  const explanationId = useId();
  const details = (
    <span className="flex min-w-0 flex-1 flex-col">
      <span className="text-xl font-black text-field-950">{machine.fleetNumber}</span>
      <span className="truncate text-field-800">{machine.name}</span>
      <span className="text-sm text-field-600">
        {CATEGORY_LABELS[machine.category]}
        {machine.lastReading
          ? ` · last ${formatMeter(machine.lastReading.value, machine.meterUnit)}`
          : ''}
      </span>
      {machine.restriction ? (
        <span className="mt-2 flex flex-col items-start gap-1">
          <RestrictedBadge />
          <span className="font-bold text-straw-900">
            {machine.restriction.reason ?? 'Ask the farm what it may be used for.'}
          </span>
        </span>
      ) : null}
    </span>
  );

  if (machine.status === 'tagged_out') {
    // not a link to the walkaround: a button that explains, and the card stays unusable
    return (
      <div className="flex flex-col rounded-xl border-2 border-dashed border-poppy-400 bg-poppy-50/60">
        <button
          type="button"
          aria-expanded={explained}
          aria-controls={explanationId}
          onClick={() => setExplained((open) => !open)}
          className="flex min-h-16 flex-col items-start gap-2 p-4 text-left"
        >
          {details}
          <span className="flex flex-wrap items-center gap-2">
            <Badge tone="overdue" icon="lock">
              Tagged out — do not use
            </Badge>
            <span className="text-sm font-bold text-poppy-800 underline underline-offset-2">
              {explained ? 'Hide why' : 'Why?'}
            </span>
          </span>
        </button>
        <div id={explanationId} hidden={!explained} className="px-4 pb-4">
          {explained ? (
            <TagOutExplanation orgId={orgId} machineId={machine.id} timeZone={timeZone} />
          ) : null}
        </div>
      </div>
    );
  }

  return (
    <Link
      to={href}
      className="flex min-h-16 items-center gap-3 rounded-xl border border-field-200 bg-white p-4 shadow-card hover:border-field-400 active:bg-field-50"
    >
      {details}
      {inProgress ? <Badge tone="info">In progress</Badge> : null}
      <Icon name="back" className="size-6 rotate-180 text-field-500" />
    </Link>
  );
}
