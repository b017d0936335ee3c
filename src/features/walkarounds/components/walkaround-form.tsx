import { useCallback, useMemo, useRef, useState, type FormEvent } from 'react';
import type { UnitSystem } from '../../../../shared/constants';
import type {
  WalkaroundCreateInput,
  WalkaroundPurpose,
} from '../../../../shared/schemas/walkarounds';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Icon } from '../../../components/ui/icons';
import { TextareaField } from '../../../components/ui/textarea-field';
import { isApiError } from '../../../lib/api-client';
import { formatMeter } from '../../../lib/fleet-format';
import { formatDateTime } from '../../../lib/format';
import type { Checklist } from '../api/types';
import { buildSubmission, type SubmissionErrors } from '../lib/build-submission';
import { useItemPhotos } from '../lib/use-item-photos';
import type { SendResult } from '../lib/use-send-walkaround';
import type { useWalkaroundDraft } from '../lib/use-walkaround-draft';
import { checklistSections, sectionProgress } from '../lib/sections';
import { ChecklistItemCard } from './checklist-item-card';
import { ChecklistSectionView } from './checklist-section';
import { DailyCareChecks } from './daily-care-checks';

type DraftApi = ReturnType<typeof useWalkaroundDraft>;

const NO_ERRORS: SubmissionErrors = { items: {} };

/** The walkaround itself: the meter, every checklist item, notes, and "Send walkaround". */
export function WalkaroundForm({
  orgId,
  checklist,
  purpose,
  units,
  timeZone,
  draftApi,
  send,
  onSent,
}: {
  orgId: string;
  checklist: Checklist;
  purpose: WalkaroundPurpose;
  units: UnitSystem;
  timeZone: string;
  draftApi: DraftApi;
  send: (
    input: WalkaroundCreateInput,
    waitingPhotos: ReadonlyMap<string, File>,
  ) => Promise<SendResult>;
  onSent: (result: SendResult) => void;
}) {
  const { machine, items } = checklist;
  const { draft, update, updateAnswer, stored, resumed, startOver } = draftApi;
  const [errors, setErrors] = useState<SubmissionErrors>(NO_ERRORS);
  const [sending, setSending] = useState(false);
  const formRef = useRef<HTMLFormElement>(null);
  const photos = useItemPhotos(orgId, machine.id, draft.clientId, (itemId, photo) =>
    updateAnswer(itemId, { photo }),
  );
  const answered = items.filter((item) => draft.answers[item.id]?.result).length;
  const meterLabel = machine.meterUnit === 'h' ? 'Hour meter' : `Meter (${machine.meterUnit})`;
  const missing = items.filter((item) => errors.items[item.id]);
  const sections = useMemo(() => checklistSections(items), [items]);
  // the items that have been on screen in this visit (not kept: a resumed draft looks again)
  const [seen, setSeen] = useState<ReadonlySet<string>>(new Set());
  const markSeen = useCallback(
    (itemId: string) => setSeen((prev) => (prev.has(itemId) ? prev : new Set(prev).add(itemId))),
    [],
  );

  const focusFirstError = (next: SubmissionErrors) => {
    const form = formRef.current;
    if (!form) return;
    requestAnimationFrame(() => {
      const target = next.meterValue
        ? form.querySelector<HTMLElement>('[aria-invalid="true"]')
        : form.querySelector<HTMLElement>('[role="radiogroup"][aria-invalid="true"] input');
      target?.focus();
    });
  };

  async function onSubmit(event: FormEvent) {
    event.preventDefault();
    if (sending) return;
    setSending(true);
    try {
      const { uploaded, waiting } = await photos.uploadWaiting();
      const answers = { ...draft.answers };
      for (const [itemId, photo] of Object.entries(uploaded))
        answers[itemId] = { ...answers[itemId], photo };
      const built = buildSubmission(
        { ...draft, answers },
        {
          machineId: machine.id,
          purpose,
          items,
          units,
          performedAt: new Date().toISOString(),
          careTaskIds: (checklist.dailyCare ?? []).map((task) => task.taskId),
        },
      );
      if (!built.ok) {
        setErrors(built.errors);
        focusFirstError(built.errors);
        return;
      }
      setErrors(NO_ERRORS);
      const result = await send(built.input, waiting);
      void photos.clearStored();
      onSent(result);
    } catch (error) {
      const next = serverErrors(error);
      setErrors(next);
      focusFirstError(next);
    } finally {
      setSending(false);
    }
  }

  return (
    <form ref={formRef} noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
      {resumed ? (
        <div className="flex flex-wrap items-center justify-between gap-2 rounded-lg bg-oat-100 p-3 text-sm text-field-800">
          <span>
            Carrying on with the walkaround you started {formatDateTime(draft.startedAt, timeZone)}.
          </span>
          <Button variant="ghost" className="min-h-12" onClick={startOver}>
            Start over
          </Button>
        </div>
      ) : null}

      <TextField
        label={meterLabel}
        inputMode="decimal"
        autoComplete="off"
        value={draft.meterValue}
        onChange={(event) => update((d) => ({ ...d, meterValue: event.target.value }))}
        error={errors.meterValue}
        className="min-h-12 text-lg"
        hint={
          machine.lastReading
            ? `Last reading: ${formatMeter(machine.lastReading.value, machine.meterUnit)} on ${formatDateTime(machine.lastReading.takenAt, timeZone)}. Type what the meter shows now.`
            : 'No reading yet. Type what the meter shows now.'
        }
      />

      <p className="flex items-start gap-2 rounded-lg border border-poppy-200 bg-white p-3 text-sm text-field-800">
        <Icon name="lock" className="mt-0.5 size-4 shrink-0 text-poppy-700" />
        <span>{checklist.criticalNote}</span>
      </p>

      <div
        role="status"
        className="sticky top-16 z-10 -mx-4 bg-oat-50/95 px-4 py-2 text-sm font-bold text-field-700 backdrop-blur sm:-mx-8 sm:px-8"
      >
        {answered} of {items.length} answered
      </div>

      <div aria-label="Checklist" role="group" className="flex flex-col gap-5">
        {sections.map((section) => {
          const progress = sectionProgress(section, draft.answers);
          return (
            <ChecklistSectionView
              key={section.key}
              section={section}
              progress={progress}
              hasErrors={section.items.some(({ item }) => errors.items[item.id])}
              seen={seen}
              onSeen={markSeen}
              onRestOk={() => {
                for (const item of progress.unanswered) updateAnswer(item.id, { result: 'ok' });
              }}
            >
              {section.items.map(({ item, position }) => (
                <ChecklistItemCard
                  key={item.id}
                  item={item}
                  position={position}
                  total={items.length}
                  fleetNumber={machine.fleetNumber}
                  answer={draft.answers[item.id]}
                  error={errors.items[item.id]}
                  photoState={photos.states[item.id]}
                  onAnswer={(change) => updateAnswer(item.id, change)}
                  onPickPhoto={(file) => photos.pick(item.id, file)}
                  onRemovePhoto={() => photos.remove(item.id)}
                />
              ))}
            </ChecklistSectionView>
          );
        })}
      </div>

      <DailyCareChecks
        items={checklist.dailyCare ?? []}
        unit={machine.meterUnit}
        timeZone={timeZone}
        done={draft.careDone ?? []}
        onChange={(careDone) => update((d) => ({ ...d, careDone }))}
      />

      <TextareaField
        label="Anything else for the shop (optional)"
        value={draft.notes}
        maxLength={2000}
        onChange={(event) => update((d) => ({ ...d, notes: event.target.value }))}
      />

      {missing.length > 0 ? (
        <Alert title={`Answer every item: ${missing.length} left`}>
          {missing.map((item) => item.label).join(', ')}.
        </Alert>
      ) : null}
      {errors.form ? <Alert>{errors.form}</Alert> : null}

      <Button
        type="submit"
        pending={sending}
        disabled={photos.busy}
        className="min-h-14 w-full text-lg"
      >
        Send walkaround
      </Button>
      <p className="text-sm text-field-600">
        {stored
          ? 'Your answers are kept on this phone as you go, so nothing is lost if the connection drops.'
          : 'This phone could not store your answers: keep the page open until it is sent.'}
      </p>
    </form>
  );
}

/** The server's refusal, placed beside the meter where it belongs there. */
function serverErrors(error: unknown): SubmissionErrors {
  if (!isApiError(error)) return { items: {}, form: 'Something went wrong. Try again.' };
  const meter = error.fields.meterValue ?? error.fields.performedAt;
  const others = Object.entries(error.fields)
    .filter(([field]) => field !== 'meterValue' && field !== 'performedAt')
    .map(([, message]) => message);
  return {
    items: {},
    meterValue: meter,
    form: others.length ? others.join(' ') : meter ? undefined : error.message,
  };
}
