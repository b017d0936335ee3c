import { useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { useFieldArray, useForm, useWatch, type Path } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import type { UnitSystem } from '../../../../shared/constants';
import { serviceRecordCreateSchema } from '../../../../shared/schemas/service-records';
import { Alert } from '../../../components/ui/alert';
import { Button, buttonClasses } from '../../../components/ui/button';
import { ApiError, isApiError } from '../../../lib/api-client';
import { applyServerErrors } from '../../../lib/form-errors';
import { withMeterReasons } from '../../../lib/meter-input';
import { prefillQueryOptions } from '../api/get-prefill';
import { useSaveServiceRecord } from '../api/save-service-record';
import type { ActiveDefect, Prefill, RecordWithResets, ShopPerson, TaskChoice } from '../api/types';
import {
  completeBody,
  createBody,
  mergePrefill,
  type ServiceFormInput,
  type ServiceFormMode,
} from '../lib/form-values';
import { OtherCostsFields, MeasurementsFields, type SheetTest } from './cost-measurement-fields';
import { PartsFields, FluidsFields } from './parts-fluids-fields';
import { ReassemblyFields } from './reassembly-fields';
import { FormBlock } from './form-block';
import { TaskChoiceList } from './task-choice-list';
import { VisitFields } from './visit-fields';
import { DefectChoiceList } from './defect-choice-list';
import { PlannedVisitOffer } from './planned-visit-offer';
import { TextareaField } from '../../../components/ui/textarea-field';

const LIST_FIELDS = ['taskIds', 'technicianIds', 'closesDefectIds'] as const;
const ROW_FIELDS = {
  parts: ['partNumber', 'description', 'quantity', 'unitCostMinor'],
  fluids: ['kind', 'volume', 'unit', 'unitCostMinor'],
  otherCosts: ['description', 'amountMinor'],
  measurements: ['name', 'value', 'unit', 'specMin', 'specMax'],
  reassemblySettings: ['what', 'value', 'restored'],
} as const;
const SCALAR_FIELDS = [
  'status',
  'plannedFor',
  'performedOn',
  'meterValue',
  'labourHours',
  'notes',
  'unrestoredReason',
  ...LIST_FIELDS,
  ...(Object.keys(ROW_FIELDS) as (keyof typeof ROW_FIELDS)[]),
] as const;

/** Every field the server may name, with the rows there are now (parts.1.quantity …). */
function fieldNames(values: ServiceFormInput): Path<ServiceFormInput>[] {
  const rows = Object.entries(ROW_FIELDS).flatMap(([list, columns]) =>
    ((values[list as keyof typeof ROW_FIELDS] as unknown[] | undefined) ?? []).flatMap((_, i) =>
      columns.map((c) => `${list}.${i}.${c}`),
    ),
  );
  return [...SCALAR_FIELDS, ...rows] as Path<ServiceFormInput>[];
}

/** `taskIds.2` (one id of a list) is shown beside the list as a whole. */
function foldListErrors(error: unknown): unknown {
  if (!isApiError(error)) return error;
  const fields: Record<string, string> = {};
  for (const [key, message] of Object.entries(error.fields)) {
    const list = LIST_FIELDS.find((name) => key.startsWith(`${name}.`));
    fields[list ?? key] = fields[list ?? key] ? `${fields[list ?? key]} ${message}` : message;
  }
  return new ApiError({ status: error.status, code: error.code, message: error.message, fields });
}

const EMPTY_PREFILL: Prefill = {
  tasks: [],
  estimatedLabourHours: 0,
  parts: [],
  fluids: [],
  plannedVisits: [],
};

export interface ServiceRecordFormProps {
  orgId: string;
  mode: ServiceFormMode;
  machine: {
    id: string;
    fleetNumber: string;
    meterUnit: string;
    lastReading: { value: number; takenAt: string } | null;
  };
  tasks: readonly TaskChoice[];
  /** who may be named as technicians; none: the field is left out (a dealer's advisor) */
  people: readonly ShopPerson[];
  /** the machine's open defects to close; null: not the caller's to see (a dealer's advisor) */
  defects: readonly ActiveDefect[] | null;
  defaultValues: ServiceFormInput;
  /** the lines the preselected tasks call for (what the rows were filled in from) */
  initialPrefill: Pick<Prefill, 'parts' | 'fluids' | 'estimatedLabourHours' | 'plannedVisits'>;
  /** the plan being completed (complete mode) */
  recordId?: string;
  today: string;
  timeZone: string;
  /** the farm's currency (ISO 4217): costs are typed in it and sent as minor units */
  currency: string;
  /** the farm's units: how a typed comma in the meter is read */
  units: UnitSystem;
  cancelHref: string;
  onSaved: (result: RecordWithResets) => void;
  /** the machine's spec sheet tests: a measurement of the same name takes its spec */
  sheetTests?: readonly SheetTest[];
}

/**
 * Records a service visit, books a plan, or completes a plan. Choosing tasks fills in the parts
 * and fluids they call for (from the server); every line stays editable. The server's refusals
 * (reading rules, an unticked reassembly setting, a bad line) show beside their fields.
 */
export function ServiceRecordForm(props: ServiceRecordFormProps) {
  const { orgId, mode, machine, tasks, defaultValues, recordId, onSaved } = props;
  const queryClient = useQueryClient();
  const save = useSaveServiceRecord(orgId, machine.id);
  const form = useForm({
    resolver: withMeterReasons(zodResolver(serviceRecordCreateSchema)),
    defaultValues,
  });
  const { control, register, handleSubmit, setError, getValues, setValue, formState } = form;
  const parts = useFieldArray({ control, name: 'parts' });
  const fluids = useFieldArray({ control, name: 'fluids' });
  const otherCosts = useFieldArray({ control, name: 'otherCosts' });
  const measurements = useFieldArray({ control, name: 'measurements' });
  const settings = useFieldArray({ control, name: 'reassemblySettings' });
  const [formError, setFormError] = useState<string | null>(null);
  const [placedErrors, setPlacedErrors] = useState(false);
  const [showReason, setShowReason] = useState(Boolean(defaultValues.unrestoredReason));
  const [estimate, setEstimate] = useState(props.initialPrefill.estimatedLabourHours);
  const [prefillState, setPrefillState] = useState<'idle' | 'loading' | 'error'>('idle');
  const lastPrefill = useRef<Pick<Prefill, 'parts' | 'fluids'>>(props.initialPrefill);
  const prefillRequest = useRef(0);
  // open plans covering the chosen tasks, and the one this visit completes (record mode)
  const [plannedVisits, setPlannedVisits] = useState(props.initialPrefill.plannedVisits);
  const [chosenPlan, setChosenPlan] = useState<string | null>(null);
  const completesPlan =
    mode === 'record' && plannedVisits.some((v) => v.id === chosenPlan) ? chosenPlan : null;
  const taskIds = useWatch({ control, name: 'taskIds' }) ?? [];
  const chosenTasks = tasks.filter((t) => taskIds.includes(t.id));
  const isPlan = mode === 'plan';

  async function chooseTasks(next: string[]) {
    setValue('taskIds', next, { shouldDirty: true });
    const request = ++prefillRequest.current;
    setPrefillState('loading');
    try {
      const prefill = next.length
        ? await queryClient.fetchQuery(prefillQueryOptions(orgId, machine.id, next))
        : EMPTY_PREFILL;
      if (request !== prefillRequest.current) return; // a later choice answers instead
      const merged = mergePrefill(
        { parts: getValues('parts') ?? [], fluids: getValues('fluids') ?? [] },
        lastPrefill.current,
        prefill,
      );
      parts.replace(merged.parts);
      fluids.replace(merged.fluids);
      lastPrefill.current = prefill;
      setEstimate(prefill.estimatedLabourHours);
      setPlannedVisits(prefill.plannedVisits);
      setPrefillState('idle');
    } catch {
      if (request === prefillRequest.current) setPrefillState('error');
    }
  }

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    setPlacedErrors(false);
    try {
      const result = await save.mutateAsync(
        mode === 'complete' || completesPlan
          ? { kind: 'complete', recordId: completesPlan ?? recordId!, body: completeBody(values) }
          : { kind: 'create', body: createBody(values) },
      );
      onSaved(result);
    } catch (error) {
      if (
        isApiError(error) &&
        Object.keys(error.fields).some((k) => /^reassemblySettings\.\d+\.restored$/.test(k))
      )
        setShowReason(true);
      const message = applyServerErrors(foldListErrors(error), setError, fieldNames(getValues()));
      setFormError(message);
      setPlacedErrors(message === null);
    }
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={isPlan ? 'Plan a service' : 'Record service'}
      className="flex flex-col gap-6"
    >
      {formError ? <Alert>{formError}</Alert> : null}
      {placedErrors ? (
        <Alert title="Not saved">Check the fields marked below: each says what to change.</Alert>
      ) : null}

      <FormBlock title="Tasks">
        <TaskChoiceList
          tasks={tasks}
          value={taskIds}
          onChange={chooseTasks}
          error={formState.errors.taskIds?.message}
          prefillState={prefillState}
          mode={mode}
        />
        {mode !== 'complete' ? (
          <PlannedVisitOffer
            mode={mode}
            visits={plannedVisits}
            value={completesPlan}
            onChange={setChosenPlan}
          />
        ) : null}
      </FormBlock>

      <FormBlock title={isPlan ? 'Booking' : 'The visit'}>
        <VisitFields
          form={form}
          mode={mode}
          machine={machine}
          people={props.people}
          estimate={estimate}
          today={props.today}
          timeZone={props.timeZone}
          units={props.units}
        />
      </FormBlock>

      <FormBlock title={isPlan ? 'Parts and fluids to pull' : 'Parts, fluids and costs'}>
        <PartsFields form={form} rows={parts} showCosts={!isPlan} currency={props.currency} />
        <FluidsFields form={form} rows={fluids} showCosts={!isPlan} currency={props.currency} />
        {!isPlan ? (
          <OtherCostsFields form={form} rows={otherCosts} currency={props.currency} />
        ) : null}
      </FormBlock>

      {!isPlan ? (
        <>
          <FormBlock title="Measurements and reassembly">
            <MeasurementsFields form={form} rows={measurements} sheetTests={props.sheetTests} />
            <ReassemblyFields
              form={form}
              rows={settings}
              tasks={chosenTasks}
              showReason={showReason}
            />
          </FormBlock>
        </>
      ) : null}

      <FormBlock title={props.defects ? 'Defects and notes' : 'Notes'}>
        {props.defects ? (
          <DefectChoiceList
            form={form}
            defects={props.defects}
            fleetNumber={machine.fleetNumber}
            isPlan={isPlan}
          />
        ) : null}
        <TextareaField
          label="Notes"
          rows={4}
          hint={isPlan ? 'What the shop should know before the visit.' : 'What was found and done.'}
          error={formState.errors.notes?.message}
          {...register('notes')}
        />
      </FormBlock>

      <div className="flex flex-col gap-2 sm:flex-row">
        <Button type="submit" icon={isPlan ? 'clock' : 'check'} pending={formState.isSubmitting}>
          {isPlan ? 'Save plan' : 'Complete service'}
        </Button>
        <Link to={props.cancelHref} className={buttonClasses('secondary')}>
          Cancel
        </Link>
      </div>
    </form>
  );
}
