import { useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Button, buttonClasses } from '../../../components/ui/button';
import { Section } from '../../../components/ui/card';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { formatDateTime } from '../../../lib/format';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';
import { useCancelServiceRecord } from '../api/cancel-service-record';
import type { RecordAbilities, ServiceRecord, TaskReset } from '../api/types';
import { formatHours } from '../lib/record-format';
import { AttachmentsSection } from './attachments-section';
import { RecordStatusBadge } from './record-badges';
import { CostLines, MeasurementLines, ReassemblyLines } from './record-lines';

interface ServiceRecordViewProps {
  orgId: string;
  record: ServiceRecord;
  abilities: RecordAbilities;
  /** what completing just did to the tasks (from the save's answer), when arriving from the form */
  resets: TaskReset[] | null;
  timeZone: string;
  completeHref: string;
  defectsHref: string | null;
}

const card = 'rounded-xl border border-field-200 bg-white p-4 shadow-card sm:p-6';

/** Everything of one service record, its files, and for a plan the way to complete or cancel it. */
export function ServiceRecordView({
  orgId,
  record,
  abilities,
  resets,
  timeZone,
  completeHref,
  defectsHref,
}: ServiceRecordViewProps) {
  const unit = record.machine.meterUnit;
  const facts: { term: string; detail: ReactNode }[] = [
    { term: 'Status', detail: <RecordStatusBadge status={record.status} /> },
  ];
  if (record.plannedFor)
    facts.push({ term: 'Planned for', detail: formatLocalDate(record.plannedFor) });
  if (record.performedOn)
    facts.push({ term: 'Date performed', detail: formatLocalDate(record.performedOn) });
  if (record.meterValue !== null)
    facts.push({
      term: 'Meter at service',
      detail:
        record.meterLifetime !== null && record.meterLifetime !== record.meterValue
          ? `${formatMeter(record.meterValue, unit)} (lifetime ${formatMeter(record.meterLifetime, unit)})`
          : formatMeter(record.meterValue, unit),
    });
  facts.push({
    term: 'Labour',
    detail:
      record.labourHours !== null
        ? `${formatHours(record.labourHours)} (estimated ${formatHours(record.estimatedLabourHours)})`
        : `Estimated ${formatHours(record.estimatedLabourHours)}`,
  });
  facts.push({
    term: 'Technicians',
    detail: record.technicians.length
      ? record.technicians.map((t) => t.name).join(', ')
      : 'None named',
  });
  if (record.completedBy && record.completedAt)
    facts.push({
      term: 'Completed by',
      detail: `${record.completedBy.name}, ${formatDateTime(record.completedAt, timeZone)}`,
    });
  else if (record.createdBy)
    facts.push({
      term: 'Booked by',
      detail: `${record.createdBy.name}, ${formatDateTime(record.createdAt, timeZone)}`,
    });

  return (
    <div className="flex flex-col gap-8">
      {resets ? <ResetsNotice resets={resets} unit={unit} /> : null}
      {record.status === 'planned' && (abilities.complete || abilities.cancel) ? (
        <PlanActions
          orgId={orgId}
          record={record}
          abilities={abilities}
          completeHref={completeHref}
        />
      ) : null}
      {record.status === 'cancelled' ? (
        <Alert tone="info">This plan was cancelled; its tasks are no longer booked.</Alert>
      ) : null}

      <dl className={`grid grid-cols-2 gap-4 sm:grid-cols-3 ${card}`}>
        {facts.map((f) => (
          <div key={f.term} className="flex flex-col gap-1">
            <dt className="text-sm font-bold text-field-600">{f.term}</dt>
            <dd className="font-bold text-field-950">{f.detail}</dd>
          </div>
        ))}
      </dl>

      <Section title="Tasks">
        <div className={card}>
          {record.tasks.length === 0 ? (
            <p className="text-field-600">No scheduled task on this visit.</p>
          ) : (
            <ul aria-label="Tasks on this visit" className="flex flex-col gap-1">
              {record.tasks.map((t) => (
                <li key={t.taskId}>
                  <span className="font-bold">{t.name}</span>
                  {t.labourHours !== null ? (
                    <span className="text-field-600"> · about {formatHours(t.labourHours)}</span>
                  ) : null}
                  {!t.onSchedule ? (
                    <span className="text-field-600"> · no longer on the schedule</span>
                  ) : null}
                </li>
              ))}
            </ul>
          )}
          {record.defectIds.length > 0 ? (
            <p className="mt-3 text-field-800">
              {record.status === 'completed' ? 'Closed' : 'Closes'} {record.defectIds.length}{' '}
              {record.defectIds.length === 1 ? 'defect' : 'defects'}.{' '}
              {defectsHref ? (
                <Link to={defectsHref} className="font-bold underline">
                  Defects
                </Link>
              ) : null}
            </p>
          ) : null}
        </div>
      </Section>

      <Section title={record.status === 'planned' ? 'Parts and fluids to pull' : 'Parts and costs'}>
        <div className={card}>
          <CostLines record={record} />
        </div>
      </Section>

      {record.status !== 'planned' || record.measurements.length > 0 ? (
        <Section title="Measurements">
          <div className={card}>
            <MeasurementLines record={record} />
          </div>
        </Section>
      ) : null}

      {record.status !== 'planned' || record.reassemblySettings.length > 0 ? (
        <Section title="Reassembly settings">
          <div className={card}>
            <ReassemblyLines record={record} />
          </div>
        </Section>
      ) : null}

      <Section title="Notes">
        <div className={card}>
          {record.notes ? (
            <p className="whitespace-pre-line">{record.notes}</p>
          ) : (
            <p className="text-field-600">No notes.</p>
          )}
        </div>
      </Section>

      <Section title="Photos and documents">
        <div className={card}>
          <AttachmentsSection
            orgId={orgId}
            recordId={record.id}
            attachments={record.attachments}
            canAttach={abilities.attach}
            timeZone={timeZone}
          />
        </div>
      </Section>
    </div>
  );
}

/** Which tasks the completed visit reset, from the server's answer. */
function ResetsNotice({ resets, unit }: { resets: TaskReset[]; unit: string }) {
  if (resets.length === 0)
    return <Alert tone="success">Service recorded. It covered no scheduled task.</Alert>;
  return (
    <Alert tone="success" title="Service recorded">
      <ul aria-label="Tasks reset" className="flex flex-col gap-1">
        {resets.map((r) => (
          <li key={r.taskId}>
            <span className="font-bold">{r.name}</span>:{' '}
            {r.reset
              ? `reset — next due counts from ${[
                  r.lastDoneMeter !== null ? formatMeter(r.lastDoneMeter, unit) : null,
                  r.lastDoneOn ? formatLocalDate(r.lastDoneOn) : null,
                ]
                  .filter(Boolean)
                  .join(' on ')}`
              : `not reset. ${r.note}`}
          </li>
        ))}
      </ul>
    </Alert>
  );
}

function PlanActions({
  orgId,
  record,
  abilities,
  completeHref,
}: {
  orgId: string;
  record: ServiceRecord;
  abilities: RecordAbilities;
  completeHref: string;
}) {
  const [confirming, setConfirming] = useState(false);
  const cancel = useCancelServiceRecord(orgId, record.machine.id, record.id);
  return (
    <div className="flex flex-wrap gap-2">
      {abilities.complete ? (
        <Link to={completeHref} className={buttonClasses()}>
          Complete this service
        </Link>
      ) : null}
      {abilities.cancel ? (
        <Button variant="secondary" icon="close" onClick={() => setConfirming(true)}>
          Cancel plan
        </Button>
      ) : null}
      <ConfirmDialog
        open={confirming}
        title="Cancel this plan?"
        confirmLabel="Cancel plan"
        pending={cancel.isPending}
        error={cancel.error ? cancel.error.message : null}
        onCancel={() => {
          setConfirming(false);
          cancel.reset();
        }}
        onConfirm={() => cancel.mutate(undefined, { onSuccess: () => setConfirming(false) })}
      >
        Its tasks are no longer booked and show as unbooked on the shop week. The record stays in
        the history as cancelled.
      </ConfirmDialog>
    </div>
  );
}
