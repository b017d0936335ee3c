import { useId } from 'react';
import { Link } from 'react-router-dom';
import { MachineStatusBadge } from '../../../components/ui/status-badges';
import { formatDateTime } from '../../../lib/format';
import type { ClosedDefect, Defect, PersonRef } from '../api/types';
import { DefectActions } from './defect-actions';
import { DefectStatusBadge, SeverityBadge } from './severity-badge';

/** One defect: severity, status, machine, who reported it and when, photo, and the shop's actions. */
export function DefectCard({
  orgId,
  defect,
  timeZone,
  machineHref,
  recordHref,
  people,
  onClosed,
}: {
  orgId: string;
  defect: Defect;
  timeZone: string;
  machineHref: (machineId: string) => string;
  recordHref: (recordId: string) => string;
  /** null: the caller may not handle defects (read-only) */
  people: PersonRef[] | null;
  onClosed: (closed: ClosedDefect) => void;
}) {
  const titleId = useId();
  const { machine } = defect;
  return (
    <article
      aria-labelledby={titleId}
      className="flex flex-col gap-3 rounded-xl border border-field-200 bg-white p-4 shadow-card"
    >
      <div className="flex flex-wrap items-center gap-2">
        <SeverityBadge severity={defect.severity} />
        <DefectStatusBadge status={defect.status} />
        {machine.status !== 'in_service' ? <MachineStatusBadge status={machine.status} /> : null}
      </div>
      <div className="flex gap-3">
        {defect.thumbnailUrl && defect.photoUrl ? (
          <a
            href={defect.photoUrl}
            target="_blank"
            rel="noreferrer"
            className="shrink-0 self-start rounded-lg"
          >
            <img
              src={defect.thumbnailUrl}
              alt={`Photo of ${defect.title} (opens the full photo)`}
              className="size-20 rounded-lg border border-field-200 object-cover"
              loading="lazy"
            />
          </a>
        ) : null}
        <div className="flex min-w-0 flex-col gap-1">
          <h2 id={titleId} className="text-lg leading-snug font-black text-field-950">
            {defect.title}
          </h2>
          <Link
            to={machineHref(machine.id)}
            className="inline-flex min-h-touch items-center self-start font-bold text-field-800 underline decoration-field-300 underline-offset-2 hover:decoration-field-800"
          >
            {machine.fleetNumber} · {machine.name}
          </Link>
          {defect.description ? <p className="text-field-800">{defect.description}</p> : null}
          <p className="text-sm text-field-600">
            Reported by {defect.reportedBy?.name ?? 'someone no longer here'},{' '}
            {formatDateTime(defect.createdAt, timeZone)}
            {defect.reportCount > 1
              ? ` · reported ${defect.reportCount} times, last ${formatDateTime(defect.lastReportedAt, timeZone)}`
              : ''}
          </p>
          {defect.status !== 'fixed' ? (
            <p className="text-sm text-field-600">
              {defect.assignedTo ? `Assigned to ${defect.assignedTo.name}` : 'Not assigned yet'}
            </p>
          ) : (
            <p className="text-sm text-clover-800">
              Fixed
              {defect.fixedBy ? ` by ${defect.fixedBy.name}` : ''}
              {defect.fixedAt ? `, ${formatDateTime(defect.fixedAt, timeZone)}` : ''}
              {defect.fixNote ? `: ${defect.fixNote}` : ''}
              {defect.fixedByRecordId ? (
                <>
                  {' · '}
                  <Link to={recordHref(defect.fixedByRecordId)} className="font-bold underline">
                    the service record that fixed it
                  </Link>
                </>
              ) : null}
            </p>
          )}
        </div>
      </div>
      {people && defect.status !== 'fixed' ? (
        <DefectActions orgId={orgId} defect={defect} people={people} onClosed={onClosed} />
      ) : null}
    </article>
  );
}
