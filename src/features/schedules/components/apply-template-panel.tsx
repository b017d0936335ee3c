import { useState } from 'react';
import { CATEGORY_LABELS, type MachineCategory } from '../../../../shared/constants';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { Skeleton } from '../../../components/ui/skeleton';
import { isApiError } from '../../../lib/api-client';
import { useApplyTemplate } from '../api/apply-template';
import { useTemplates } from '../api/get-templates';
import { describeInterval } from '../lib/task-text';

interface ApplyTemplatePanelProps {
  orgId: string;
  machineId: string;
  category: MachineCategory;
  unit: string;
  existingTaskNames: string[];
  onDone: () => void;
}

/**
 * Choose a schedule template of the machine's category and add all its tasks at once. The
 * template's intervals are typical figures, labelled as such: the manual's figures replace them.
 */
export function ApplyTemplatePanel({
  orgId,
  machineId,
  category,
  unit,
  existingTaskNames,
  onDone,
}: ApplyTemplatePanelProps) {
  const templates = useTemplates(orgId, category);
  const apply = useApplyTemplate(orgId, machineId);
  const [chosenId, setChosenId] = useState<string | null>(null);
  const list = templates.data?.data ?? [];
  const chosen = list.find((t) => t.id === chosenId) ?? list[0];
  const repeats = chosen
    ? chosen.tasks.filter((t) => existingTaskNames.includes(t.name)).map((t) => t.name)
    : [];

  return (
    <section
      aria-label="Apply template"
      className="flex flex-col gap-4 rounded-xl border border-field-300 bg-white p-4 shadow-card"
    >
      <h3 className="text-lg font-black text-field-950">Apply a schedule template</h3>
      {templates.isPending ? (
        <div role="status" className="flex flex-col gap-2">
          <span className="sr-only">Loading templates</span>
          <Skeleton className="h-10 w-full" />
          <Skeleton className="h-24 w-full" />
        </div>
      ) : templates.isError ? (
        <Alert>{templates.error.message}</Alert>
      ) : list.length === 0 ? (
        <Alert tone="info">
          There is no schedule template for {CATEGORY_LABELS[category].toLowerCase()}s yet. Add the
          tasks one by one instead.
        </Alert>
      ) : (
        <>
          <SelectField
            label="Template"
            options={list.map((t) => ({ value: t.id, label: t.name }))}
            value={chosen?.id ?? ''}
            onChange={(event) => setChosenId(event.target.value)}
          />
          {chosen ? (
            <div className="flex flex-col gap-3">
              {chosen.description ? <p className="text-field-800">{chosen.description}</p> : null}
              <Alert tone="warning" title="Typical figures of common practice">
                These intervals are not from this machine's manual. After applying, replace each one
                with the figure of the operator's manual.
              </Alert>
              <div>
                <h4 className="font-bold text-field-900">
                  {chosen.tasks.length} tasks, with typical intervals
                </h4>
                <ul className="mt-1 flex flex-col gap-1">
                  {chosen.tasks.map((t, i) => (
                    <li key={i} className="flex flex-wrap gap-x-2">
                      <span className="font-bold">{t.name}</span>
                      <span className="text-field-700">
                        {describeInterval(
                          {
                            intervalMeter: t.intervalMeter ?? null,
                            intervalDays: t.intervalDays ?? null,
                            seasonAnchor: t.seasonAnchor,
                            seasonOffsetDays: t.seasonOffsetDays,
                          },
                          unit,
                        )}{' '}
                        (typical)
                      </span>
                    </li>
                  ))}
                </ul>
              </div>
              {repeats.length > 0 ? (
                <Alert tone="info">
                  The schedule already has {repeats.join(', ')}. Applying adds the template's tasks
                  beside the ones already there.
                </Alert>
              ) : null}
            </div>
          ) : null}
          {apply.error ? (
            <Alert>
              {isApiError(apply.error)
                ? (apply.error.fields.templateId ?? apply.error.message)
                : 'Could not apply the template. Try again.'}
            </Alert>
          ) : null}
        </>
      )}
      <div className="flex flex-col gap-2 sm:flex-row">
        {chosen ? (
          <Button
            pending={apply.isPending}
            onClick={() => apply.mutate(chosen.id, { onSuccess: onDone })}
          >
            Apply template
          </Button>
        ) : null}
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </section>
  );
}
