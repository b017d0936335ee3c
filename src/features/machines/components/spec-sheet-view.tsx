import type { ReactNode } from 'react';
import { testConditionsWords, specRangeWords } from '../../../../shared/domain/measurement-spec';
import {
  CAPACITY_KEYS,
  CAPACITY_LABELS,
  CAPACITY_UNIT_LABELS,
  FILTER_ROLES,
  FILTER_ROLE_LABELS,
  TORQUE_UNIT_LABELS,
  TYRE_POSITIONS,
  TYRE_POSITION_LABELS,
} from '../../../../shared/schemas/spec-keys';
import { Caution } from '../../../components/ui/caution';
import type { SpecSheet } from '../api/get-spec-sheet';

const num = (n: number) => n.toLocaleString('en-US', { maximumFractionDigits: 4 });

/** True when nothing at all is on the sheet. */
export const sheetIsEmpty = (s: SpecSheet) =>
  !Object.keys(s.capacities).length &&
  !s.extraCapacities.length &&
  !Object.keys(s.filters).length &&
  !s.extraFilters.length &&
  !Object.keys(s.tyrePressures).length &&
  !s.torques.length &&
  !s.testPressures.length &&
  !s.notes;

function Block({ title, rows }: { title: string; rows: [string, ReactNode][] }) {
  if (!rows.length) return null;
  return (
    <div>
      <h3 className="mb-1 font-black text-field-900">{title}</h3>
      <dl className="divide-y divide-field-100">
        {rows.map(([term, detail], i) => (
          <div key={`${term}-${i}`} className="flex flex-col gap-0.5 py-2 sm:flex-row sm:gap-4">
            <dt className="font-bold text-field-700 sm:w-64 sm:shrink-0">{term}</dt>
            <dd className="text-field-950">{detail}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}

const capacityText = (c: { quantity: number | null; unit: 'L' | 'gal'; spec: string }) =>
  [
    c.quantity !== null ? `${num(c.quantity)} ${CAPACITY_UNIT_LABELS[c.unit]}` : null,
    c.spec || null,
  ]
    .filter(Boolean)
    .join(' — ');

/**
 * The sheet as the farm entered it. A test pressure is always shown with the conditions it holds
 * at: without them the figure cannot be checked.
 */
export function SpecSheetView({ sheet }: { sheet: SpecSheet }) {
  const capacities: [string, ReactNode][] = [
    ...CAPACITY_KEYS.flatMap((k): [string, ReactNode][] => {
      const c = sheet.capacities[k];
      return c ? [[CAPACITY_LABELS[k], capacityText(c)]] : [];
    }),
    ...sheet.extraCapacities.map((c): [string, ReactNode] => [c.name, capacityText(c)]),
  ];
  const filters: [string, ReactNode][] = [
    ...FILTER_ROLES.flatMap((r): [string, ReactNode][] => {
      const n = sheet.filters[r];
      return n ? [[FILTER_ROLE_LABELS[r], <span className="font-mono">{n}</span>]] : [];
    }),
    ...sheet.extraFilters.map((f): [string, ReactNode] => [
      f.name,
      <span className="font-mono">{f.partNumber}</span>,
    ]),
  ];
  const tyres = TYRE_POSITIONS.flatMap((p): [string, ReactNode][] => {
    const t = sheet.tyrePressures[p];
    return t
      ? [
          [
            `${TYRE_POSITION_LABELS[p]} tyres`,
            [`${num(t.value)} ${t.unit}`, t.note].filter(Boolean).join(' — '),
          ],
        ]
      : [];
  });
  const torques = sheet.torques.map((t): [string, ReactNode] => [
    t.name,
    [`${num(t.value)} ${TORQUE_UNIT_LABELS[t.unit]}`, t.note].filter(Boolean).join(' — '),
  ]);
  const tests = sheet.testPressures.map((t): [string, ReactNode] => {
    const conditions = testConditionsWords(t);
    return [
      t.name,
      <span>
        <span className="font-bold tabular-nums">{specRangeWords(t.min, t.max, t.unit)}</span>
        {conditions ? (
          ` ${conditions}`
        ) : (
          <span className="text-straw-800"> — no test conditions given</span>
        )}
      </span>,
    ];
  });
  return (
    <div className="flex flex-col gap-4">
      <Block title="Capacities and fluids" rows={capacities} />
      <Block title="Filters and part numbers" rows={filters} />
      <Block title="Tyre pressures" rows={tyres} />
      <Block title="Torques" rows={torques} />
      <Block title="Test pressures" rows={tests} />
      {tests.length || tyres.length ? (
        <Caution
          compact
          label="Testing and inflating"
          heading="Caution"
          text="A pressure test runs with the engine on and the system under pressure: gauges and hoses rated above the test pressure, everyone clear of the machine's moving parts."
          hazards={[
            ...(tests.length ? ['hydraulic_pressure'] : []),
            ...(tyres.length ? ['tyres_rims'] : []),
          ]}
          defer
        />
      ) : null}
      {sheet.notes ? (
        <p className="whitespace-pre-line rounded-lg bg-field-50 p-3 text-field-800">
          {sheet.notes}
        </p>
      ) : null}
    </div>
  );
}
