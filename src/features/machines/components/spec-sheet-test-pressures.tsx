import type { UnitSystem } from '../../../../shared/constants';
import {
  TEMPERATURE_UNITS,
  TEMPERATURE_UNIT_LABELS,
  TEST_PRESSURE_UNITS,
} from '../../../../shared/schemas/spec-keys';
import { useFieldArray } from 'react-hook-form';
import { SelectField, TextField } from '../../../components/ui/field';
import { defaultUnits, optionalNumber } from '../lib/spec-sheet-form';
import { decimal, SheetBlock, SheetRow, type SpecSheetFormApi } from './spec-sheet-fields';
import { Remove, Rows } from './spec-sheet-lists';

// The test pressures of the spec sheet form, each with the conditions it holds at.

const PRESSURE_OPTIONS = TEST_PRESSURE_UNITS.map((value) => ({ value, label: value }));
const TEMPERATURE_OPTIONS = TEMPERATURE_UNITS.map((value) => ({
  value,
  label: TEMPERATURE_UNIT_LABELS[value],
}));

export function TestPressureFields({ form, units }: { form: SpecSheetFormApi; units: UnitSystem }) {
  const { register, control, formState } = form;
  const tests = useFieldArray({ control, name: 'testPressures' });
  const u = defaultUnits(units);
  return (
    <SheetBlock
      legend="Test pressures"
      hint="Each with the conditions it holds at — engine speed, oil temperature and any other (gear, test port): a pressure without them cannot be checked. A service measurement of the same name takes its spec from here."
    >
      <Rows
        count={tests.fields.length}
        empty="No test pressures."
        add="Add test pressure"
        onAdd={() =>
          tests.append({
            name: '',
            min: null,
            max: null,
            unit: u.pressure,
            engineRpm: null,
            oilTemperature: { value: null, unit: u.temperature },
            conditions: '',
          })
        }
      >
        {tests.fields.map((row, i) => {
          const e = formState.errors.testPressures?.[i];
          const label = `Test pressure ${i + 1}`;
          return (
            <SheetRow key={row.id} label={label} columns="sm:grid-cols-[1fr_6rem_6rem_5rem_auto]">
              <TextField
                label="Test name"
                placeholder="PTO clutch pressure"
                error={e?.name?.message}
                {...register(`testPressures.${i}.name`)}
              />
              <TextField
                label="Minimum"
                {...decimal}
                error={e?.min?.message}
                {...register(`testPressures.${i}.min`, optionalNumber)}
              />
              <TextField
                label="Maximum"
                {...decimal}
                error={e?.max?.message}
                {...register(`testPressures.${i}.max`, optionalNumber)}
              />
              <SelectField
                label="Unit"
                options={PRESSURE_OPTIONS}
                error={e?.unit?.message}
                {...register(`testPressures.${i}.unit`)}
              />
              <Remove label={label} onClick={() => tests.remove(i)} />
              <div className="grid gap-3 sm:col-span-full sm:grid-cols-[7rem_7rem_5rem_1fr]">
                <TextField
                  label="Engine speed (rpm)"
                  {...decimal}
                  error={e?.engineRpm?.message}
                  {...register(`testPressures.${i}.engineRpm`, optionalNumber)}
                />
                <TextField
                  label="Oil temperature"
                  {...decimal}
                  error={e?.oilTemperature?.value?.message}
                  {...register(`testPressures.${i}.oilTemperature.value`, optionalNumber)}
                />
                <SelectField
                  label="Temperature unit"
                  options={TEMPERATURE_OPTIONS}
                  error={e?.oilTemperature?.unit?.message}
                  {...register(`testPressures.${i}.oilTemperature.unit`)}
                />
                <TextField
                  label="Other conditions"
                  placeholder="PTO engaged, 1,000 rpm stub"
                  error={e?.conditions?.message}
                  {...register(`testPressures.${i}.conditions`)}
                />
              </div>
            </SheetRow>
          );
        })}
      </Rows>
    </SheetBlock>
  );
}
