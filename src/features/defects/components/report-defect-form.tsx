import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import {
  DEFECT_SEVERITY_LABELS,
  defectCreateSchema,
  type DefectSeverity,
} from '../../../../shared/schemas/defects';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { TextareaField } from '../../../components/ui/textarea-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useReportDefect, type ReportedDefect } from '../api/report-defect';
import type { MachineOption } from '../api/types';

// the server's body, plus the machine it goes to (part of the URL)
const reportSchema = defectCreateSchema.extend({
  machineId: z.string().min(1, { error: 'Choose the machine' }),
});

const SEVERITY_ORDER: DefectSeverity[] = ['minor', 'major', 'critical'];

/** Report a defect on a machine (any farm role); critical tags it out at once. */
export function ReportDefectForm({
  orgId,
  machines,
  defaultMachineId,
}: {
  orgId: string;
  /** machines that may be reported on (not sold) */
  machines: MachineOption[];
  defaultMachineId?: string;
}) {
  const report = useReportDefect(orgId);
  const [formError, setFormError] = useState<string | null>(null);
  const [reported, setReported] = useState<ReportedDefect | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    control,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(reportSchema),
    defaultValues: {
      machineId: defaultMachineId ?? '',
      title: '',
      description: '',
      severity: 'major' as DefectSeverity,
    },
  });
  const severity = useWatch({ control, name: 'severity' });

  const onSubmit = handleSubmit(async ({ machineId, ...input }) => {
    setFormError(null);
    setReported(null);
    try {
      const answer = await report.mutateAsync({ machineId, input });
      setReported(answer);
      reset({ machineId, title: '', description: '', severity: 'major' });
    } catch (error) {
      setFormError(
        applyServerErrors(error, setError, ['machineId', 'title', 'description', 'severity']),
      );
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <Alert>{formError}</Alert> : null}
      {reported ? (
        reported.taggedOut && reported.message ? (
          <Alert title={`Reported on ${reported.machine.fleetNumber}`}>{reported.message}.</Alert>
        ) : (
          <Alert tone="success">
            Reported on {reported.machine.fleetNumber}: {reported.data.title}. The shop sees it in
            this list.
          </Alert>
        )
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          label="Machine"
          options={[
            { value: '', label: 'Choose a machine' },
            ...machines.map((m) => ({ value: m.id, label: `${m.fleetNumber} · ${m.name}` })),
          ]}
          error={errors.machineId?.message}
          {...register('machineId')}
        />
        <SelectField
          label="Severity"
          options={SEVERITY_ORDER.map((s) => ({ value: s, label: DEFECT_SEVERITY_LABELS[s] }))}
          hint={
            severity === 'critical'
              ? 'Critical tags the machine out: nobody may use it until a technician or manager returns it to service.'
              : 'Critical when the machine must not be used.'
          }
          error={errors.severity?.message}
          {...register('severity')}
        />
      </div>
      <TextField label="What is wrong" error={errors.title?.message} {...register('title')} />
      <TextareaField
        label="Details (optional)"
        hint="Where on the machine, since when, what you noticed."
        error={errors.description?.message}
        {...register('description')}
      />
      <Button type="submit" pending={isSubmitting} className="min-h-12 self-start">
        Report defect
      </Button>
    </form>
  );
}
