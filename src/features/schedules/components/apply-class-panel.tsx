import { useState } from 'react';
import type { MachineCategory, MeterUnit } from '../../../../shared/constants';
import {
  MACHINE_CLASS_CATEGORY,
  MACHINE_CLASS_LABELS,
  MACHINE_CLASSES,
  SERVICE_LIBRARY_NOTE,
  serviceLibraryClass,
  type MachineClass,
} from '../../../../shared/domain/service-library';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useApplyMachineClass, type MachineClassApplied } from '../api/apply-machine-class';
import { describeInterval } from '../lib/task-text';

interface ApplyClassPanelProps {
  orgId: string;
  machineId: string;
  category: MachineCategory;
  /** the machine's meter unit: the class's figures are shown (and applied) in it */
  meterUnit: string;
  machineClass: MachineClass | null;
  onDone: (result: MachineClassApplied | null) => void;
}

/** The classes of the machine's category first, then the rest, each in the library's order. */
const ordered = (category: MachineCategory) => [
  ...MACHINE_CLASSES.filter((c) => MACHINE_CLASS_CATEGORY[c] === category),
  ...MACHINE_CLASSES.filter((c) => MACHINE_CLASS_CATEGORY[c] !== category),
];

/**
 * Pick the machine's class from the service library and put its set of tasks on the machine in
 * one step. The intervals are common practice, labelled as such: the operator's manual wins.
 */
export function ApplyClassPanel(props: ApplyClassPanelProps) {
  const { orgId, machineId, category, onDone } = props;
  const classes = ordered(category);
  const [chosen, setChosen] = useState<MachineClass>(props.machineClass ?? classes[0]);
  const apply = useApplyMachineClass(orgId, machineId);
  const library = serviceLibraryClass(chosen, props.meterUnit as MeterUnit);

  return (
    <section
      aria-label="Apply a machine class"
      className="flex flex-col gap-4 rounded-xl border border-field-300 bg-white p-4 shadow-card"
    >
      <h3 className="text-lg font-black text-field-950">Service library: apply a machine class</h3>
      <SelectField
        label="Machine class"
        options={classes.map((c) => ({ value: c, label: MACHINE_CLASS_LABELS[c] }))}
        value={chosen}
        onChange={(event) => setChosen(event.target.value as MachineClass)}
        error={apply.error && isApiError(apply.error) ? apply.error.fields.machineClass : undefined}
      />
      <p className="text-field-800">{library.description}</p>
      <Alert tone="warning" title="Common practice — the operator's manual wins">
        {SERVICE_LIBRARY_NOTE}
      </Alert>
      {library.conversion ? <p className="text-field-800">{library.conversion}</p> : null}
      <div>
        <h4 className="font-bold text-field-900">
          {library.tasks.length} tasks, with intervals of common practice
        </h4>
        <ul className="mt-1 flex flex-col gap-1">
          {library.tasks.map((t) => (
            <li key={t.name} className="flex flex-wrap gap-x-2">
              <span className="font-bold">{t.name}</span>
              <span className="text-field-700">
                {describeInterval(t, library.meterUnit)}
                {t.firstServiceMeter !== null
                  ? `, first at ${t.firstServiceMeter} ${library.meterUnit}`
                  : ''}
              </span>
            </li>
          ))}
        </ul>
      </div>
      <p className="text-field-800">
        Tasks of the same name already on this machine are kept as they are; applying the same class
        again adds nothing.
      </p>
      {apply.error && !(isApiError(apply.error) && apply.error.fields.machineClass) ? (
        <Alert>
          {isApiError(apply.error)
            ? apply.error.message
            : 'Could not apply the machine class. Try again.'}
        </Alert>
      ) : null}
      <div className="flex flex-col gap-2 sm:flex-row">
        <Button
          pending={apply.isPending}
          onClick={() => apply.mutate(chosen, { onSuccess: (result) => onDone(result) })}
        >
          Apply class
        </Button>
        <Button variant="secondary" onClick={() => onDone(null)}>
          Cancel
        </Button>
      </div>
    </section>
  );
}
