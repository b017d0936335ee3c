import { Controller } from 'react-hook-form';
import type { ActiveDefect } from '../api/types';
import type { ServiceForm } from '../lib/form-values';
import { ChoiceList } from './choice-list';

const SEVERITY: Record<ActiveDefect['severity'], string> = {
  critical: 'Critical',
  major: 'Major',
  minor: 'Minor',
};
const STATUS: Record<ActiveDefect['status'], string> = {
  open: 'Open',
  in_repair: 'In repair',
  fixed: 'Fixed',
};

/**
 * The machine's open defects; the ones ticked are closed by this record when it is completed.
 * Closing never changes the machine's status: returning to service is its own step.
 */
export function DefectChoiceList({
  form,
  defects,
  fleetNumber,
  isPlan,
}: {
  form: ServiceForm;
  defects: readonly ActiveDefect[];
  fleetNumber: string;
  isPlan: boolean;
}) {
  return (
    <Controller
      control={form.control}
      name="closesDefectIds"
      render={({ field, fieldState }) => (
        <ChoiceList
          legend="Defects this visit fixes"
          hint={
            isPlan
              ? 'Ticked defects are closed when the plan is completed. Closing them does not release a tagged-out machine.'
              : 'Ticked defects are closed by this record. A tagged-out machine stays tagged out until a technician or manager returns it to service, with a note of what was checked, from this record or the machine page.'
          }
          emptyText={`${fleetNumber} has no open defects.`}
          value={field.value ?? []}
          onChange={field.onChange}
          error={fieldState.error?.message}
          options={defects.map((d) => ({
            value: d.id,
            label: `Closes defect: ${d.title}`,
            detail: `${SEVERITY[d.severity]} · ${STATUS[d.status]}`,
          }))}
        />
      )}
    />
  );
}
