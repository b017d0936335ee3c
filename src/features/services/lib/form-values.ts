import type { UseFormReturn } from 'react-hook-form';
import type { z } from 'zod';
import {
  serviceRecordCreateSchema,
  type ServiceRecordCompleteInput,
  type ServiceRecordCreateInput,
} from '../../../../shared/schemas/service-records';
import type { Prefill, ServiceRecord } from '../api/types';

// The service form's values: the same shape the server validates (serviceRecordCreateSchema), so
// the form validates with that schema and the server's field paths (parts.1.quantity) match ours.

export type ServiceFormInput = z.input<typeof serviceRecordCreateSchema>;
export type ServiceFormValues = z.output<typeof serviceRecordCreateSchema>;

/** record: a visit done now; plan: a booking; complete: finishing a booked plan */
export type ServiceFormMode = 'record' | 'plan' | 'complete';

type PartRow = NonNullable<ServiceFormInput['parts']>[number];
type FluidRow = NonNullable<ServiceFormInput['fluids']>[number];

const partKey = (p: { partNumber: string }) => p.partNumber.trim().toUpperCase();
const fluidKey = (f: { kind: string; unit: string }) => `${f.kind.trim().toLowerCase()}|${f.unit}`;

export const partsOf = (prefill: Pick<Prefill, 'parts'>): PartRow[] =>
  prefill.parts.map((p) => ({ ...p, unitCostMinor: p.unitCostMinor ?? null }));
export const fluidsOf = (prefill: Pick<Prefill, 'fluids'>): FluidRow[] =>
  prefill.fluids.map((f) => ({ ...f, unitCostMinor: f.unitCostMinor ?? null }));

/**
 * The part and fluid rows after the task choice changed: the lines the new tasks call for
 * (keeping a unit cost or description typed on a matching line), then the rows that were typed
 * by hand. Lines only the old tasks called for go.
 */
export function mergePrefill(
  current: { parts: PartRow[]; fluids: FluidRow[] },
  previous: Pick<Prefill, 'parts' | 'fluids'>,
  next: Pick<Prefill, 'parts' | 'fluids'>,
): { parts: PartRow[]; fluids: FluidRow[] } {
  const oldParts = new Set(previous.parts.map(partKey));
  const newParts = new Set(next.parts.map(partKey));
  const partRows = new Map(current.parts.map((p) => [partKey(p), p]));
  const oldFluids = new Set(previous.fluids.map(fluidKey));
  const newFluids = new Set(next.fluids.map(fluidKey));
  const fluidRows = new Map(current.fluids.map((f) => [fluidKey(f), f]));
  return {
    parts: [
      ...partsOf(next).map((p) => {
        const typed = partRows.get(partKey(p));
        return typed
          ? {
              ...p,
              description: typed.description || p.description,
              unitCostMinor: typed.unitCostMinor,
            }
          : p;
      }),
      ...current.parts.filter((p) => !oldParts.has(partKey(p)) && !newParts.has(partKey(p))),
    ],
    fluids: [
      ...fluidsOf(next).map((f) => {
        const typed = fluidRows.get(fluidKey(f));
        return typed ? { ...f, unitCostMinor: typed.unitCostMinor } : f;
      }),
      ...current.fluids.filter((f) => !oldFluids.has(fluidKey(f)) && !newFluids.has(fluidKey(f))),
    ],
  };
}

/** A new visit or plan: the chosen tasks with the lines they call for, today, the signed-in person. */
export function newRecordDefaults(
  mode: 'record' | 'plan',
  options: {
    today: string;
    /** the date to book a plan for (default today) */
    plannedFor?: string | null;
    taskIds: string[];
    prefill: Prefill;
    technicianIds: string[];
  },
): ServiceFormInput {
  return {
    status: mode === 'plan' ? 'planned' : 'completed',
    plannedFor: mode === 'plan' ? (options.plannedFor ?? options.today) : null,
    performedOn: mode === 'record' ? options.today : undefined,
    meterValue: undefined,
    taskIds: options.taskIds,
    technicianIds: options.technicianIds,
    labourHours: null,
    parts: partsOf(options.prefill),
    fluids: fluidsOf(options.prefill),
    otherCosts: [],
    notes: '',
    measurements: [],
    reassemblySettings: [],
    unrestoredReason: '',
    closesDefectIds: [],
  };
}

/** Completing a plan: everything the plan carries, done today. */
export function completeDefaults(
  record: ServiceRecord,
  options: { today: string; activeDefectIds: string[] },
): ServiceFormInput {
  return {
    status: 'completed',
    plannedFor: record.plannedFor,
    performedOn: options.today,
    meterValue: undefined,
    // a task removed from the schedule since the plan was made can no longer be reset
    taskIds: record.tasks.filter((t) => t.onSchedule).map((t) => t.taskId),
    technicianIds: record.technicians.map((t) => t.id),
    labourHours: record.labourHours,
    parts: record.parts.map(({ lineCostMinor: _, ...p }) => p),
    fluids: record.fluids.map(({ lineCostMinor: _, ...f }) => f),
    otherCosts: record.otherCosts.map((c) => ({ ...c })),
    notes: record.notes,
    measurements: record.measurements.map(({ name, value, unit, specMin, specMax }) => ({
      name,
      value,
      unit,
      specMin,
      specMax,
    })),
    reassemblySettings: record.reassemblySettings.map((s) => ({ ...s })),
    unrestoredReason: record.unrestoredReason,
    closesDefectIds: record.defectIds.filter((id) => options.activeDefectIds.includes(id)),
  };
}

/** The body of POST …/service-records for a visit or a plan (a plan sends no visit facts). */
export function createBody(values: ServiceFormValues): ServiceRecordCreateInput {
  if (values.status === 'planned') {
    const { performedOn: _p, meterValue: _m, meterReadAt: _r, ...plan } = values;
    return { ...plan, measurements: [], reassemblySettings: [], unrestoredReason: '' };
  }
  return { ...values, plannedFor: null };
}

/** The body of POST …/service-records/:id/complete. */
export function completeBody(values: ServiceFormValues): ServiceRecordCompleteInput {
  const { status: _s, plannedFor: _p, meterReadAt: _r, performedOn, meterValue, ...rest } = values;
  return { ...rest, performedOn: performedOn!, meterValue: meterValue! };
}

/** The form as the section components receive it. */
export type ServiceForm = UseFormReturn<ServiceFormInput, unknown, ServiceFormValues>;

/** Number inputs: an empty box is null (optional figures) or undefined (required ones, so the schema names them). */
export const optionalNumber = {
  setValueAs: (v: unknown) => (v === '' || v == null ? null : Number(v)),
};
export const requiredNumber = {
  setValueAs: (v: unknown) => (v === '' || v == null ? undefined : Number(v)),
};
