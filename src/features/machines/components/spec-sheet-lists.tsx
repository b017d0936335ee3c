import type { ReactNode } from 'react';
import { useFieldArray } from 'react-hook-form';
import type { UnitSystem } from '../../../../shared/constants';
import { TORQUE_UNITS, TORQUE_UNIT_LABELS } from '../../../../shared/schemas/spec-keys';
import { FLUID_SPEC_MAX } from '../../../../shared/schemas/spec-sheet';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { defaultUnits, optionalNumber } from '../lib/spec-sheet-form';
import {
  CAPACITY_UNIT_OPTIONS,
  decimal,
  SheetBlock,
  SheetRow,
  type SpecSheetFormApi,
} from './spec-sheet-fields';

// The list sections of the spec sheet form: extra compartments and parts and torques, each row
// added and removed by hand (test pressures: spec-sheet-test-pressures.tsx).

const TORQUE_OPTIONS = TORQUE_UNITS.map((value) => ({ value, label: TORQUE_UNIT_LABELS[value] }));

export function Rows({
  count,
  empty,
  add,
  onAdd,
  children,
}: {
  count: number;
  empty: string;
  add: string;
  onAdd: () => void;
  children: ReactNode;
}) {
  return (
    <>
      {count === 0 ? <p className="text-field-600">{empty}</p> : null}
      {children}
      <div>
        <Button variant="secondary" icon="plus" onClick={onAdd}>
          {add}
        </Button>
      </div>
    </>
  );
}

export const Remove = ({ label, onClick }: { label: string; onClick: () => void }) => (
  <Button
    variant="ghost"
    icon="trash"
    className="sm:mt-8"
    aria-label={`Remove ${label.toLowerCase()}`}
    onClick={onClick}
  >
    Remove
  </Button>
);

export function ExtraLinesFields({ form, units }: { form: SpecSheetFormApi; units: UnitSystem }) {
  const { register, control, formState } = form;
  const errors = formState.errors;
  const capacities = useFieldArray({ control, name: 'extraCapacities' });
  const parts = useFieldArray({ control, name: 'extraFilters' });
  return (
    <SheetBlock legend="Other compartments and parts">
      <Rows
        count={capacities.fields.length}
        empty="No other compartments."
        add="Add compartment"
        onAdd={() =>
          capacities.append({
            name: '',
            quantity: null,
            unit: defaultUnits(units).capacity,
            spec: '',
          })
        }
      >
        {capacities.fields.map((row, i) => {
          const e = errors.extraCapacities?.[i];
          const label = `Compartment ${i + 1}`;
          return (
            <SheetRow key={row.id} label={label} columns="sm:grid-cols-[1fr_7rem_7rem_1fr_auto]">
              <TextField
                label="Compartment"
                error={e?.name?.message}
                {...register(`extraCapacities.${i}.name`)}
              />
              <TextField
                label="Quantity"
                {...decimal}
                error={e?.quantity?.message}
                {...register(`extraCapacities.${i}.quantity`, optionalNumber)}
              />
              <SelectField
                label="Unit"
                options={CAPACITY_UNIT_OPTIONS}
                error={e?.unit?.message}
                {...register(`extraCapacities.${i}.unit`)}
              />
              <TextField
                label="Fluid specification"
                maxLength={FLUID_SPEC_MAX}
                error={e?.spec?.message}
                {...register(`extraCapacities.${i}.spec`)}
              />
              <Remove label={label} onClick={() => capacities.remove(i)} />
            </SheetRow>
          );
        })}
      </Rows>
      <Rows
        count={parts.fields.length}
        empty="No other parts."
        add="Add part"
        onAdd={() => parts.append({ name: '', partNumber: '' })}
      >
        {parts.fields.map((row, i) => {
          const e = errors.extraFilters?.[i];
          const label = `Part ${i + 1}`;
          return (
            <SheetRow key={row.id} label={label} columns="sm:grid-cols-[1fr_1fr_auto]">
              <TextField
                label="Part"
                error={e?.name?.message}
                {...register(`extraFilters.${i}.name`)}
              />
              <TextField
                label="Part number"
                spellCheck={false}
                error={e?.partNumber?.message}
                {...register(`extraFilters.${i}.partNumber`)}
              />
              <Remove label={label} onClick={() => parts.remove(i)} />
            </SheetRow>
          );
        })}
      </Rows>
    </SheetBlock>
  );
}

export function TorqueFields({ form, units }: { form: SpecSheetFormApi; units: UnitSystem }) {
  const { register, control, formState } = form;
  const torques = useFieldArray({ control, name: 'torques' });
  return (
    <SheetBlock legend="Torques">
      <Rows
        count={torques.fields.length}
        empty="No torques."
        add="Add torque"
        onAdd={() =>
          torques.append({ name: '', value: null, unit: defaultUnits(units).torque, note: '' })
        }
      >
        {torques.fields.map((row, i) => {
          const e = formState.errors.torques?.[i];
          const label = `Torque ${i + 1}`;
          return (
            <SheetRow key={row.id} label={label} columns="sm:grid-cols-[1fr_7rem_6rem_1fr_auto]">
              <TextField
                label="What"
                placeholder="Wheel nuts"
                error={e?.name?.message}
                {...register(`torques.${i}.name`)}
              />
              <TextField
                label="Torque"
                {...decimal}
                error={e?.value?.message}
                {...register(`torques.${i}.value`, optionalNumber)}
              />
              <SelectField
                label="Unit"
                options={TORQUE_OPTIONS}
                error={e?.unit?.message}
                {...register(`torques.${i}.unit`)}
              />
              <TextField
                label="Note"
                placeholder="Cross pattern, re-torque at 10 h"
                error={e?.note?.message}
                {...register(`torques.${i}.note`)}
              />
              <Remove label={label} onClick={() => torques.remove(i)} />
            </SheetRow>
          );
        })}
      </Rows>
    </SheetBlock>
  );
}
