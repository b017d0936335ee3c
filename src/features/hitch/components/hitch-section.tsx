import { useState } from 'react';
import {
  HITCH_IMPLEMENT_CATEGORIES,
  HITCH_METER_KIND_LABELS,
} from '../../../../shared/schemas/hitch';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { SelectField } from '../../../components/ui/field';
import { formatMeter } from '../../../lib/fleet-format';
import { formatDateTime } from '../../../lib/format';
import { useEndHitch } from '../api/end-hitch';
import { useHitchLog } from '../api/get-hitch-log';
import { useStartHitch } from '../api/start-hitch';
import { HitchHistory } from './hitch-history';

export interface HitchMachine {
  id: string;
  fleetNumber: string;
  name: string;
  category: string;
}

interface HitchSectionProps {
  orgId: string;
  machine: HitchMachine;
  /** the farm's tractors, to hitch an implement to (the page reads them) */
  tractors: { id: string; fleetNumber: string; name: string }[];
  timeZone: string;
}

const isImplement = (category: string) =>
  (HITCH_IMPLEMENT_CATEGORIES as readonly string[]).includes(category);

/**
 * The hitch log on a machine's page: on an implement, the tractor it is on now (unhitch), a
 * tractor to hitch it to, its hours from hitching and its spans; on a tractor, what it pulls now.
 */
export function HitchSection({ orgId, machine, tractors, timeZone }: HitchSectionProps) {
  const log = useHitchLog(orgId, machine.id);
  const start = useStartHitch(orgId);
  const end = useEndHitch(orgId);
  const [tractorId, setTractorId] = useState('');
  if (log.isPending) return <p className="text-field-600">Loading the hitch log…</p>;
  if (log.isError) return <Alert title="The hitch log didn't load">{log.error.message}</Alert>;

  const { spans, hitchHours, abilities } = log.data.data;
  const implement = isImplement(machine.category);
  const open = spans.filter((s) => s.endedAt === null);
  const current = implement ? open.find((s) => s.implement.id === machine.id) : undefined;
  const pulling = implement ? [] : open.filter((s) => s.tractor.id === machine.id);
  const failure = start.error ?? end.error;

  return (
    <div className="flex flex-col gap-4">
      {implement ? (
        <p className="text-lg">
          <span className="font-bold">Hours from hitching:</span>{' '}
          <span data-testid="hitch-hours">{formatMeter(hitchHours, 'h')}</span>
        </p>
      ) : null}
      {failure ? <Alert title="Not saved">{failure.message}</Alert> : null}

      {implement && current ? (
        <div className="flex flex-wrap items-center gap-3">
          <p>
            On <strong>{current.tractor.fleetNumber}</strong> {current.tractor.name} since{' '}
            {formatDateTime(current.startedAt, timeZone)}, counting{' '}
            {HITCH_METER_KIND_LABELS[current.meterKind]}.
          </p>
          {abilities.start ? (
            <Button
              variant="secondary"
              pending={end.isPending}
              onClick={() => end.mutate(current.id)}
            >
              Unhitch from {current.tractor.fleetNumber}
            </Button>
          ) : null}
        </div>
      ) : null}

      {implement && !current && abilities.start ? (
        <form
          className="flex flex-wrap items-end gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            if (tractorId) start.mutate({ implementId: machine.id, tractorId });
          }}
        >
          <div className="w-full sm:w-auto sm:min-w-60">
            <SelectField
              label="Tractor"
              value={tractorId}
              onChange={(e) => setTractorId(e.target.value)}
              options={[
                { value: '', label: 'Pick the tractor' },
                ...tractors.map((t) => ({ value: t.id, label: `${t.fleetNumber} · ${t.name}` })),
              ]}
            />
          </div>
          <Button type="submit" pending={start.isPending} disabled={!tractorId}>
            Hitch now
          </Button>
        </form>
      ) : null}

      {!implement ? (
        pulling.length ? (
          <ul aria-label="Pulling now" className="flex flex-col gap-2">
            {pulling.map((s) => (
              <li key={s.id}>
                Pulling <strong>{s.implement.fleetNumber}</strong> {s.implement.name} since{' '}
                {formatDateTime(s.startedAt, timeZone)} ({formatMeter(s.hours, 'h')} so far)
              </li>
            ))}
          </ul>
        ) : (
          <p className="text-field-700">Pulling nothing now.</p>
        )
      ) : null}

      {spans.length ? (
        <HitchHistory spans={spans} timeZone={timeZone} />
      ) : (
        <EmptyState title="No hitch log yet">
          {implement
            ? 'Hitch this implement to a tractor and it counts the hours the tractor runs while it is on.'
            : 'Implements hitched to this tractor show here.'}
        </EmptyState>
      )}
    </div>
  );
}
