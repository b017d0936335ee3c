import { useRef, useState } from 'react';
import { useFieldArray, useForm, useWatch, type Path } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { CATEGORY_LABELS, type MachineCategory } from '../../../../shared/constants';
import { checklistTemplateCreateSchema } from '../../../../shared/schemas/walkarounds';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { TextareaField } from '../../../components/ui/textarea-field';
import { changedFields } from '../../../lib/changed-fields';
import { applyServerErrors } from '../../../lib/form-errors';
import { useSaveTemplate } from '../api/save-template';
import { classOptions } from '../lib/class-options';
import type { BuiltInChecklist, ChecklistTemplate } from '../api/types';
import { ChecklistItemFields, type ChecklistFormValues } from './checklist-item-fields';

const blankItem = () => ({
  label: '',
  guidance: '',
  critical: false,
  hazards: [],
  caution: '',
  phase: 'before_start' as const,
  classes: [],
});

/**
 * Edit a category's walkaround checklist: name, description (with its sources), and the items
 * (label, guidance, when it is checked, the classes it is for, critical, hazards, caution), added,
 * removed and reordered. Saving a category
 * that still uses the built-in list creates the farm's own from the edited copy.
 */
export function ChecklistEditor({
  orgId,
  category,
  template,
  start,
  justSaved,
  onSaved,
}: {
  orgId: string;
  category: MachineCategory;
  /** the farm's checklist; null: none yet, `start` (the built-in list) is the starting point */
  template: ChecklistTemplate | null;
  start: ChecklistTemplate | BuiltInChecklist;
  /** this category was saved a moment ago (the editor may have been remounted since) */
  justSaved: boolean;
  onSaved: () => void;
}) {
  const save = useSaveTemplate(orgId);
  const [formError, setFormError] = useState<string | null>(null);
  const [openKeys, setOpenKeys] = useState<Set<string>>(new Set());
  // what the server holds: an edit of the farm's checklist sends only the fields changed from it
  const saved = useRef<ChecklistFormValues>({
    category,
    name: start.name,
    description: start.description,
    items: start.items,
  });
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting, isDirty },
  } = useForm({
    resolver: zodResolver(checklistTemplateCreateSchema),
    defaultValues: saved.current,
  });
  // the items carry their own `id` (kept so past walkarounds still match): rows get `key`
  const items = useFieldArray({ control, name: 'items', keyName: 'key' });
  const watched = useWatch({ control, name: 'items' });
  const options = classOptions(
    category,
    start.items.flatMap((i) => i.classes),
  );

  // A new item opens for typing; its row key exists only once the append has rendered.
  const [openNew, setOpenNew] = useState(false);
  const lastKey = items.fields.at(-1)?.key;
  if (openNew && lastKey) {
    setOpenNew(false);
    if (!openKeys.has(lastKey)) setOpenKeys(new Set([...openKeys, lastKey]));
  }

  const toggle = (key: string) =>
    setOpenKeys((keys) => {
      const next = new Set(keys);
      if (next.has(key)) next.delete(key);
      else next.add(key);
      return next;
    });

  const onSubmit = handleSubmit(
    async (values) => {
      setFormError(null);
      try {
        const result = await save.mutateAsync(
          template
            ? { templateId: template.id, input: changedFields(saved.current, values) }
            : { templateId: null, input: values },
        );
        saved.current = {
          category,
          name: result.name,
          description: result.description,
          items: result.items,
        };
        reset(saved.current);
        onSaved();
      } catch (error) {
        const names = ['name', 'description', 'items'].concat(
          values.items.flatMap((_, i) =>
            ['label', 'guidance', 'critical', 'hazards', 'caution', 'phase', 'classes'].map(
              (f) => `items.${i}.${f}`,
            ),
          ),
        ) as Path<ChecklistFormValues>[];
        setFormError(applyServerErrors(error, setError, names));
      }
    },
    // open the items that need fixing, so their errors show
    (invalid) =>
      setOpenKeys(
        (keys) =>
          new Set([
            ...keys,
            ...items.fields.filter((_, i) => invalid.items?.[i]).map((field) => field.key),
          ]),
      ),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {formError ? <Alert>{formError}</Alert> : null}
      {justSaved && !isDirty ? (
        <Alert tone="success">
          Saved. Walkarounds started from now on use this list; past ones keep the items they were
          done with.
        </Alert>
      ) : null}
      {!template ? (
        <Alert tone="info">
          {CATEGORY_LABELS[category]} walkarounds use Hourstone&apos;s built-in list. Edit it below
          and save to make it this farm&apos;s own.
        </Alert>
      ) : null}
      <TextField label="Name" error={errors.name?.message} {...register('name')} />
      <TextareaField
        label="Description and sources"
        hint="Say what the list follows (a published checklist, the operator's manual) so whoever uses it knows where it comes from."
        rows={4}
        error={errors.description?.message}
        {...register('description')}
      />
      <section aria-labelledby="checklist-items" className="flex flex-col gap-3">
        <h2 id="checklist-items" className="text-xl font-black text-field-900">
          Items ({items.fields.length})
        </h2>
        {errors.items?.message || errors.items?.root?.message ? (
          <Alert>{errors.items?.message ?? errors.items?.root?.message}</Alert>
        ) : null}
        <ol className="flex flex-col gap-2">
          {items.fields.map((field, index) => (
            <li key={field.key}>
              <ChecklistItemFields
                index={index}
                count={items.fields.length}
                label={watched?.[index]?.label ?? ''}
                critical={Boolean(watched?.[index]?.critical)}
                hazardCount={watched?.[index]?.hazards?.length ?? 0}
                running={watched?.[index]?.phase === 'running'}
                classCount={watched?.[index]?.classes?.length ?? 0}
                classOptions={options}
                open={openKeys.has(field.key)}
                control={control}
                register={register}
                errors={errors}
                onToggle={() => toggle(field.key)}
                onMove={(to) => items.move(index, to)}
                onRemove={() => items.remove(index)}
              />
            </li>
          ))}
        </ol>
        <Button
          variant="secondary"
          icon="plus"
          className="min-h-12 self-start"
          onClick={() => {
            items.append(blankItem(), { shouldFocus: false });
            setOpenNew(true);
          }}
        >
          Add item
        </Button>
      </section>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={isSubmitting} className="min-h-12">
          Save checklist
        </Button>
        {isDirty ? (
          <Button variant="ghost" className="min-h-12" onClick={() => reset()}>
            Undo changes
          </Button>
        ) : null}
      </div>
    </form>
  );
}
