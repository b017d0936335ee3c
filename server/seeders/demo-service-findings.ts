// What the demo's service visits measured (PTO clutch pressure, battery voltage, freeze
// protection) and which settings they recorded at reassembly. All values are invented.
import type { UnitSystem } from '../../shared/constants';
import type { ReassemblySetting } from '../../shared/schemas/service-records';
import { createRandom, seedFromString } from './random';
import { round, type DemoMachineWorld, type Visit } from './demo-service-visits';

const imperial = (units: UnitSystem) => units === 'imperial';

/** Tractor visits at which the PTO clutch pressure is checked: the PTO check and the larger services. */
const PRESSURE_CHECKED_WITH = [
  'PTO clutch and brake check',
  'Engine oil and filter',
  'Hydraulic/transmission filters',
  'Hydraulic/transmission oil',
];
export const checksPto = (m: DemoMachineWorld, v: Visit) =>
  m.category === 'tractor' && v.tasks.some((t) => PRESSURE_CHECKED_WITH.includes(t.name));

/** PTO clutch pressure (bar or psi; spec 17–21 bar, invented for the demo), falling on T-01. */
function ptoPressure(
  m: DemoMachineWorld,
  index: number,
  count: number,
  rng: ReturnType<typeof createRandom>,
) {
  const bar =
    m.fleetNumber === 'T-01'
      ? 19.8 - (count > 1 ? (3.2 * index) / (count - 1) : 0)
      : 18.6 + rng.between(0, 1.8);
  const psi = imperial(m.units);
  return {
    name: 'PTO clutch pressure',
    value: psi ? round(bar * 14.5038, 0) : round(bar, 1),
    unit: psi ? 'psi' : 'bar',
    specMin: psi ? 247 : 17,
    specMax: psi ? 305 : 21,
  };
}

export function measurementsFor(m: DemoMachineWorld, v: Visit, ptoIndex: number, ptoCount: number) {
  const rng = createRandom(seedFromString(`measure/${m.fleetNumber}/${v.date}`));
  const out: {
    name: string;
    value: number;
    unit: string;
    specMin: number | null;
    specMax: number | null;
  }[] = [];
  if (ptoIndex >= 0) out.push(ptoPressure(m, ptoIndex, ptoCount, rng));
  for (const t of v.tasks) {
    if (t.name === 'Battery check')
      out.push({
        name: 'Battery voltage (rested)',
        value: round(12.35 + rng.between(0, 0.4), 2),
        unit: 'V',
        specMin: 12.4,
        specMax: null,
      });
    if (t.name === 'Coolant freeze-point test before winter' || t.name === 'Coolant change')
      out.push(
        imperial(m.units)
          ? {
              name: 'Coolant freeze protection',
              value: round(-30 - rng.between(0, 8), 0),
              unit: '°F',
              specMin: null,
              specMax: -22,
            }
          : {
              name: 'Coolant freeze protection',
              value: round(-34 - rng.between(0, 4), 0),
              unit: '°C',
              specMin: null,
              specMax: -30,
            },
      );
  }
  return out;
}

export function settingsFor(
  m: DemoMachineWorld,
  v: Visit,
  lastPto: boolean,
): { settings: ReassemblySetting[]; reason: string } {
  const psi = imperial(m.units);
  const settings: ReassemblySetting[] = [];
  let reason = '';
  if (v.tasks.some((t) => t.name === 'PTO clutch and brake check')) {
    const pending = lastPto && m.fleetNumber === 'T-02';
    settings.push(
      { what: 'PTO brake band adjuster', value: '2½ turns out from seated', restored: !pending },
      {
        what: 'Shim pack under the PTO brake anchor',
        value: psi ? '0.016 in (two shims), rear side' : '0.40 mm (two shims), rear side',
        restored: true,
      },
      {
        what: 'PTO clutch housing bolts',
        value: psi ? 'torque 89 lb·ft' : 'torque 120 N·m',
        restored: true,
      },
    );
    if (pending)
      reason =
        'Brake band adjuster left at 3 turns out until the new lining beds in; reset at the next check.';
  }
  if (v.tasks.some((t) => t.name === 'Hydraulic/transmission oil'))
    settings.push({
      what: 'Suction screen cover bolts',
      value: psi ? 'torque 18 lb·ft' : 'torque 25 N·m',
      restored: true,
    });
  return { settings, reason };
}
