import { useId } from 'react';
import { Badge } from '../../../components/ui/badge';
import { Caution } from '../../../components/ui/caution';
import { Icon } from '../../../components/ui/icons';
import type { ChecklistItem } from '../api/types';
import { emptyAnswer, type DraftAnswer } from '../lib/draft';
import { PhotoButton, PhotoStatus, type PhotoState } from './item-photo';
import { ResultChoice } from './result-choice';

interface ChecklistItemCardProps {
  item: ChecklistItem;
  position: number;
  total: number;
  fleetNumber: string;
  answer: DraftAnswer | undefined;
  error: string | undefined;
  photoState: PhotoState | undefined;
  onAnswer: (change: Partial<DraftAnswer>) => void;
  onPickPhoto: (file: File) => void;
  onRemovePhoto: () => void;
}

/** One checklist item: what to check, its caution, OK / Attention / Fail, a note, a photo. */
export function ChecklistItemCard({
  item,
  position,
  total,
  fleetNumber,
  answer = emptyAnswer(),
  error,
  photoState,
  onAnswer,
  onPickPhoto,
  onRemovePhoto,
}: ChecklistItemCardProps) {
  const id = useId();
  const labelId = `${id}-label`;
  const errorId = `${id}-error`;
  const noteId = `${id}-note`;
  const criticalFail = item.critical && answer.result === 'fail';

  return (
    <li
      data-item-id={item.id}
      className={
        error
          ? 'rounded-xl border-2 border-poppy-500 bg-white p-4'
          : 'rounded-xl border border-field-200 bg-white p-4 shadow-card'
      }
    >
      <div className="flex flex-col gap-3">
        <div className="flex flex-col gap-1">
          <p className="text-sm font-bold text-field-500">
            {position} of {total}
          </p>
          <div className="flex flex-wrap items-start justify-between gap-2">
            <h3 id={labelId} className="text-lg leading-snug font-black text-field-950">
              {item.label}
            </h3>
            {item.critical ? (
              <Badge tone="overdue" icon="lock">
                Critical
              </Badge>
            ) : null}
          </div>
          {item.guidance ? <p className="text-field-700">{item.guidance}</p> : null}
        </div>
        {/* The server's caution ends by deferring to the manual and local rules; a farm's own
            wording without that line gets it added. */}
        {item.caution ? (
          <Caution
            compact
            heading="Caution."
            text={item.caution}
            defer={!/operator's manual/i.test(item.caution)}
          />
        ) : null}
        <ResultChoice
          name={item.id}
          labelledBy={labelId}
          describedBy={error ? errorId : undefined}
          value={answer.result}
          invalid={Boolean(error)}
          onChange={(result) => onAnswer({ result })}
        />
        {error ? (
          <p id={errorId} className="flex items-start gap-1.5 text-sm font-bold text-poppy-700">
            <Icon name="error" className="mt-0.5 size-4 shrink-0" />
            <span>{error}</span>
          </p>
        ) : null}
        {criticalFail ? (
          <p className="flex items-start gap-2 rounded-lg bg-poppy-50 p-3 font-bold text-poppy-800">
            <Icon name="lock" className="mt-0.5 size-5 shrink-0" />
            <span>
              This item is critical: sending a fail tags {fleetNumber} out. It must not be used
              until a technician or manager clears it.
            </span>
          </p>
        ) : null}
        <div className="flex items-end gap-2">
          <div className="flex min-w-0 flex-1 flex-col gap-1">
            <div className="flex flex-wrap items-baseline gap-x-1.5">
              <label htmlFor={noteId} className="font-bold text-field-900">
                Note<span className="sr-only"> for {item.label}</span>
              </label>
              <span className="text-sm text-field-500">
                {answer.result && answer.result !== 'ok' ? 'what did you find?' : '(optional)'}
              </span>
            </div>
            <textarea
              id={noteId}
              rows={answer.result && answer.result !== 'ok' ? 3 : 1}
              value={answer.note}
              maxLength={1000}
              onChange={(event) => onAnswer({ note: event.target.value })}
              className="min-h-12 w-full rounded-lg border border-field-300 bg-white px-3 py-2.5 text-base text-field-950 hover:border-field-500"
            />
          </div>
          <PhotoButton itemLabel={item.label} state={photoState} onPick={onPickPhoto} />
        </div>
        <PhotoStatus
          itemLabel={item.label}
          photo={answer.photo}
          state={photoState}
          onRemove={onRemovePhoto}
        />
      </div>
    </li>
  );
}
