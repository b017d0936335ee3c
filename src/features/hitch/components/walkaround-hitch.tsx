import { useState, type FormEvent } from 'react';
import { HITCH_METER_KIND_LABELS, type HitchMeterKind } from '../../../../shared/schemas/hitch';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { formatDateTime } from '../../../lib/format';
import { useMachineMeters } from '../../../lib/meters';
import { useEndHitch } from '../api/end-hitch';
import { useHitchLog } from '../api/get-hitch-log';
import { useStartHitch } from '../api/start-hitch';

export interface HitchableImplement {
  id: string;
  fleetNumber: string;
  name: string;
}

interface WalkaroundHitchProps {
  orgId: string;
  tractor: { id: string; fleetNumber: string };
  /** the farm's implements the caller sees (the page reads them) */
  implementsToPick: HitchableImplement[];
  timeZone: string;
}

const NONE = '';

/**
 * "What is hitched?" at the start of a tractor's walkaround: the implement on it now, or none.
 * Saving opens a span on the hitch log for a newly hitched implement (then closes the spans of
 * what came off), or closes them all for none. A refusal (the implement is on another tractor,
 * say) is the server's own words; nothing changes then.
 */
export function WalkaroundHitch({
  orgId,
  tractor,
  implementsToPick,
  timeZone,
}: WalkaroundHitchProps) {
  const log = useHitchLog(orgId, tractor.id);
  const meters = useMachineMeters(orgId, tractor.id);
  const start = useStartHitch(orgId);
  const end = useEndHitch(orgId);
  const [choice, setChoice] = useState<string | null>(null);
  const [kind, setKind] = useState<HitchMeterKind>('engine_hours');
  const [saved, setSaved] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);

  if (log.isPending) return <p className="text-field-600">Loading what is hitched…</p>;
  if (log.isError) return <Alert title="The hitch log didn't load">{log.error.message}</Alert>;

  const open = log.data.data.spans.filter((s) => s.endedAt === null && s.tractor.id === tractor.id);
  const current = open[0]?.implement.id ?? NONE;
  const picked = choice ?? current;
  const hasPto = (meters.data?.data ?? []).some((m) => m.kind === 'pto_hours');
  const options = [
    ...open.map((s) => s.implement),
    ...implementsToPick.filter((i) => !open.some((s) => s.implement.id === i.id)),
  ];
  const pending = start.isPending || end.isPending;
  const nameOf = (id: string) => options.find((o) => o.id === id)?.fleetNumber ?? 'the implement';

  if (!log.data.data.abilities.start) {
    return (
      <p>
        Hitched now: {open.length ? open.map((s) => s.implement.fleetNumber).join(', ') : 'nothing'}
        .
      </p>
    );
  }

  const save = async (e: FormEvent) => {
    e.preventDefault();
    setFailure(null);
    setSaved(null);
    try {
      if (picked !== NONE && !open.some((s) => s.implement.id === picked))
        await start.mutateAsync({ implementId: picked, tractorId: tractor.id, meterKind: kind });
      for (const s of open.filter((s) => s.implement.id !== picked)) await end.mutateAsync(s.id);
      setChoice(null);
      setSaved(
        picked === NONE
          ? `Recorded: nothing on ${tractor.fleetNumber} now.`
          : `Recorded: ${nameOf(picked)} on ${tractor.fleetNumber}; it counts ${tractor.fleetNumber}'s hours while it is on.`,
      );
    } catch (err) {
      setFailure(err instanceof Error ? err.message : 'The hitch was not saved');
    }
  };

  return (
    <form
      aria-label="Hitched implement"
      className="flex flex-col gap-3 rounded-lg border border-field-200 p-3"
      onSubmit={save}
    >
      <p className="text-sm text-field-700">
        {open.length
          ? `On ${tractor.fleetNumber} since ${formatDateTime(open[0].startedAt, timeZone)}: ${open.map((s) => s.implement.fleetNumber).join(', ')}.`
          : `Nothing is on ${tractor.fleetNumber} by the hitch log.`}{' '}
        An implement without a meter of its own counts the tractor&apos;s hours while it is on.
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <div className="w-full sm:w-auto sm:min-w-60">
          <SelectField
            label="Implement hitched now"
            value={picked}
            onChange={(e) => setChoice(e.target.value)}
            options={[
              { value: NONE, label: 'None' },
              ...options.map((i) => ({ value: i.id, label: `${i.fleetNumber} · ${i.name}` })),
            ]}
          />
        </div>
        {hasPto && picked !== NONE && picked !== current ? (
          <div className="w-full sm:w-auto sm:min-w-60">
            <SelectField
              label="It counts"
              value={kind}
              onChange={(e) => setKind(e.target.value as HitchMeterKind)}
              options={(['engine_hours', 'pto_hours'] as const).map((k) => ({
                value: k,
                label: HITCH_METER_KIND_LABELS[k],
              }))}
            />
          </div>
        ) : null}
        <Button type="submit" variant="secondary" pending={pending} disabled={picked === current}>
          Save hitch
        </Button>
      </div>
      {failure ? <Alert title="Hitch not saved">{failure}</Alert> : null}
      {saved ? (
        <p role="status" className="text-field-800">
          {saved}
        </p>
      ) : null}
    </form>
  );
}
