import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { UnitSystem } from '../../../../shared/constants';
import type { SpecSheetUpdateInput } from '../../../../shared/schemas/spec-sheet';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextareaField } from '../../../components/ui/textarea-field';
import { applyServerErrors } from '../../../lib/form-errors';
import type { SpecSheet, SpecSheetSaved } from '../api/get-spec-sheet';
import { useSaveSpecSheet } from '../api/save-spec-sheet';
import {
  sheetToForm,
  specSheetFieldNames,
  specSheetFormSchema,
  type SpecSheetFormValues,
} from '../lib/spec-sheet-form';
import { CapacitiesFields, FiltersFields, TyreFields } from './spec-sheet-fields';
import { ExtraLinesFields, TorqueFields } from './spec-sheet-lists';
import { TestPressureFields } from './spec-sheet-test-pressures';

/**
 * Edits the whole sheet: every section is sent, blank rows as cleared. The server's refusals
 * show beside their fields; units start in the farm's system and each row may take another.
 */
export function SpecSheetForm({
  orgId,
  machineId,
  sheet,
  units,
  onSaved,
  onCancel,
}: {
  orgId: string;
  machineId: string;
  sheet: SpecSheet;
  units: UnitSystem;
  onSaved: (saved: SpecSheetSaved) => void;
  onCancel: () => void;
}) {
  const save = useSaveSpecSheet(orgId, machineId);
  const form = useForm<SpecSheetFormValues, unknown, SpecSheetUpdateInput>({
    resolver: zodResolver(specSheetFormSchema),
    defaultValues: sheetToForm(sheet, units),
  });
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, getValues, formState } = form;

  const submit = handleSubmit(async (body) => {
    setFormError(null);
    try {
      onSaved(await save.mutateAsync(body));
    } catch (error) {
      setFormError(applyServerErrors(error, setError, specSheetFieldNames(getValues())));
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Spec sheet" className="flex flex-col gap-6">
      {formError ? <Alert>{formError}</Alert> : null}
      <CapacitiesFields form={form} />
      <FiltersFields form={form} />
      <ExtraLinesFields form={form} units={units} />
      <TyreFields form={form} />
      <TorqueFields form={form} units={units} />
      <TestPressureFields form={form} units={units} />
      <TextareaField
        label="Notes"
        rows={3}
        hint="Where the figures come from (the manual's section, the dealer), anything they hold for."
        error={formState.errors.notes?.message}
        {...register('notes')}
      />
      <div className="flex flex-col gap-2 sm:flex-row">
        <Button type="submit" icon="check" pending={formState.isSubmitting}>
          Save spec sheet
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
