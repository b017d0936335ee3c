import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useUpdateDefect } from '../api/update-defect';
import type { ClosedDefect, Defect, PersonRef } from '../api/types';
import { CloseDefectForm } from './close-defect-form';

/** The shop's actions on an open defect: assign, start or stop the repair, close it. */
export function DefectActions({
  orgId,
  defect,
  people,
  onClosed,
}: {
  orgId: string;
  defect: Defect;
  people: PersonRef[];
  onClosed: (closed: ClosedDefect) => void;
}) {
  const update = useUpdateDefect(orgId);
  const [closing, setClosing] = useState(false);
  const error = update.error
    ? isApiError(update.error)
      ? update.error.message
      : 'That did not save. Try again.'
    : null;

  // someone assigned earlier may have left the shop: keep them selectable so the value shows
  const assignable =
    defect.assignedTo && !people.some((p) => p.id === defect.assignedTo!.id)
      ? [...people, defect.assignedTo]
      : people;

  return (
    <div className="flex flex-col gap-3 border-t border-field-100 pt-3">
      {error ? <Alert>{error}</Alert> : null}
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <div className="sm:w-64">
          <SelectField
            label="Assigned to"
            options={[
              { value: '', label: 'Nobody yet' },
              ...assignable.map((p) => ({ value: p.id, label: p.name })),
            ]}
            value={defect.assignedTo?.id ?? ''}
            disabled={update.isPending}
            onChange={(event) =>
              update.mutate({
                defectId: defect.id,
                input: { assignedTo: event.target.value || null },
              })
            }
          />
        </div>
        <div className="flex flex-wrap gap-2">
          {defect.status === 'open' ? (
            <Button
              variant="secondary"
              icon="refresh"
              className="min-h-12"
              pending={update.isPending && update.variables?.input.status === 'in_repair'}
              onClick={() => update.mutate({ defectId: defect.id, input: { status: 'in_repair' } })}
            >
              Start repair
            </Button>
          ) : (
            <Button
              variant="ghost"
              className="min-h-12"
              pending={update.isPending && update.variables?.input.status === 'open'}
              onClick={() => update.mutate({ defectId: defect.id, input: { status: 'open' } })}
            >
              Back to open
            </Button>
          )}
          <Button
            icon="check"
            className="min-h-12"
            aria-expanded={closing}
            onClick={() => setClosing((was) => !was)}
          >
            Close
          </Button>
        </div>
      </div>
      {closing ? (
        <CloseDefectForm
          orgId={orgId}
          defect={defect}
          onDone={() => setClosing(false)}
          onClosed={onClosed}
        />
      ) : null}
    </div>
  );
}
