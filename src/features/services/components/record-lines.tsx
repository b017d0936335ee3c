import type { ReactNode } from 'react';
import { Badge } from '../../../components/ui/badge';
import type { ServiceRecord } from '../api/types';
import { formatMoney } from '../../../lib/format';
import { formatQuantity, specRangeText } from '../lib/record-format';
import { SpecStatusBadge } from './record-badges';

const line = 'flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 py-2';

/** Parts, fluids and other costs, each line with its cost as the server worked it out. */
export function CostLines({ record }: { record: ServiceRecord }) {
  const { parts, fluids, otherCosts, costs, currency } = record;
  const showCosts = record.status !== 'planned';
  const money = (minor: number) => formatMoney(minor, currency);
  const cost = (minor: number | null) =>
    minor === null ? <span className="text-field-600">no cost given</span> : money(minor);
  return (
    <div className="flex flex-col gap-4">
      <LineGroup title="Parts" empty="No parts.">
        {parts.map((p, i) => (
          <li key={i} className={line}>
            <span>
              <span className="font-bold tabular-nums">{formatQuantity(p.quantity)} ×</span>{' '}
              <span className="font-bold">{p.partNumber}</span>
              {p.description ? ` — ${p.description}` : ''}
              {showCosts && p.unitCostMinor !== null ? (
                <span className="text-field-600"> · {money(p.unitCostMinor)} each</span>
              ) : null}
            </span>
            {showCosts ? <span className="tabular-nums">{cost(p.lineCostMinor)}</span> : null}
          </li>
        ))}
      </LineGroup>
      <LineGroup title="Fluids" empty="No fluids.">
        {fluids.map((f, i) => (
          <li key={i} className={line}>
            <span>
              <span className="font-bold tabular-nums">
                {formatQuantity(f.volume)} {f.unit}
              </span>{' '}
              {f.kind}
              {showCosts && f.unitCostMinor !== null ? (
                <span className="text-field-600">
                  {' '}
                  · {money(f.unitCostMinor)} per {f.unit}
                </span>
              ) : null}
            </span>
            {showCosts ? <span className="tabular-nums">{cost(f.lineCostMinor)}</span> : null}
          </li>
        ))}
      </LineGroup>
      {showCosts ? (
        <>
          <LineGroup title="Other costs" empty="No other costs.">
            {otherCosts.map((c, i) => (
              <li key={i} className={line}>
                <span>{c.description}</span>
                <span className="tabular-nums">{money(c.amountMinor)}</span>
              </li>
            ))}
          </LineGroup>
          <dl
            aria-label="Costs"
            className="grid grid-cols-2 gap-x-6 gap-y-1 rounded-lg bg-oat-50 p-3 sm:grid-cols-4"
          >
            {(
              [
                ['Parts', costs.partsMinor],
                ['Fluids', costs.fluidsMinor],
                ['Other', costs.otherMinor],
                ['Total', costs.totalMinor],
              ] as const
            ).map(([term, value]) => (
              <div key={term} className="flex flex-col">
                <dt className="text-sm font-bold text-field-600">{term}</dt>
                <dd
                  className={`tabular-nums ${term === 'Total' ? 'text-lg font-black' : 'font-bold'}`}
                >
                  {money(value)}
                </dd>
              </div>
            ))}
            {costs.linesWithoutCost > 0 ? (
              <p className="col-span-full text-sm text-field-700">
                {costs.linesWithoutCost} {costs.linesWithoutCost === 1 ? 'line has' : 'lines have'}{' '}
                no unit cost and {costs.linesWithoutCost === 1 ? 'is' : 'are'} not counted.
              </p>
            ) : null}
          </dl>
        </>
      ) : null}
    </div>
  );
}

function LineGroup({
  title,
  empty,
  children,
}: {
  title: string;
  empty: string;
  children: ReactNode[];
}) {
  return (
    <div>
      <h3 className="font-black text-field-900">{title}</h3>
      {children.length === 0 ? (
        <p className="text-field-600">{empty}</p>
      ) : (
        <ul aria-label={title} className="divide-y divide-field-100">
          {children}
        </ul>
      )}
    </div>
  );
}

/** Each measurement with its spec and the server's verdict, in words. */
export function MeasurementLines({ record }: { record: ServiceRecord }) {
  if (record.measurements.length === 0)
    return <p className="text-field-600">No measurements taken.</p>;
  return (
    <ul aria-label="Measurements" className="divide-y divide-field-100">
      {record.measurements.map((m) => {
        const spec = specRangeText(m.specMin, m.specMax, m.unit);
        return (
          <li key={m.id} className={line}>
            <span>
              <span className="font-bold">{m.name}</span>:{' '}
              <span className="font-bold tabular-nums">
                {formatQuantity(m.value)}
                {m.unit ? ` ${m.unit}` : ''}
              </span>
              {spec ? <span className="text-field-600"> · spec {spec}</span> : null}
            </span>
            <SpecStatusBadge status={m.specStatus} />
          </li>
        );
      })}
    </ul>
  );
}

/** The settings to restore on reassembly, each restored or not, and the reason if one is not. */
export function ReassemblyLines({ record }: { record: ServiceRecord }) {
  if (record.reassemblySettings.length === 0)
    return <p className="text-field-600">No reassembly settings recorded.</p>;
  return (
    <div className="flex flex-col gap-2">
      <ul aria-label="Reassembly settings" className="divide-y divide-field-100">
        {record.reassemblySettings.map((s, i) => (
          <li key={i} className={line}>
            <span>
              <span className="font-bold">{s.what}</span>: {s.value}
            </span>
            {s.restored ? (
              <Badge tone="ok" icon="check">
                Restored
              </Badge>
            ) : (
              <Badge tone="overdue" icon="alert">
                Not restored
              </Badge>
            )}
          </li>
        ))}
      </ul>
      {record.unrestoredReason ? (
        <p className="rounded-lg bg-straw-50 p-3 text-straw-900">
          <span className="font-bold">Why not restored:</span> {record.unrestoredReason}
        </p>
      ) : null}
    </div>
  );
}
