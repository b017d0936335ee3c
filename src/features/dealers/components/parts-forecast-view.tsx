import { DUE_HORIZONS } from '../../../../shared/constants';
import { buttonClasses } from '../../../components/ui/button';
import { Section } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { SelectField } from '../../../components/ui/field';
import { Icon } from '../../../components/ui/icons';
import { LoadingRegion, Skeleton } from '../../../components/ui/skeleton';
import { TableScroll } from '../../../components/ui/table-scroll';
import { stockUnitLabel } from '../../../../shared/domain/stock-units';
import { partsCsvHref, usePartsForecast } from '../api/get-parts-forecast';
import type { FluidLine, PartLine, PartsForecast } from '../api/types';
import { dateText } from './dealer-format';
import { PartsWearTable } from './parts-wear-table';

const number = new Intl.NumberFormat(undefined, { maximumFractionDigits: 3 });
const HORIZONS = DUE_HORIZONS.map((d) => ({ value: String(d), label: `Next ${d} days` }));

interface PartsForecastViewProps {
  orgId: string;
  horizon: number;
  customerId: string | null;
  onChange: (change: { horizon?: number; customerId?: string | null }) => void;
}

/** Parts and fluids to stock for the services due inside the horizon, in total and per customer. */
export function PartsForecastView({
  orgId,
  horizon,
  customerId,
  onChange,
}: PartsForecastViewProps) {
  const forecast = usePartsForecast(orgId, horizon, customerId);
  if (forecast.isPending)
    return (
      <LoadingRegion label="Loading the parts forecast">
        <div className="flex flex-col gap-4">
          <Skeleton className="h-12 w-full rounded-lg" />
          <Skeleton className="h-48 w-full rounded-xl" />
        </div>
      </LoadingRegion>
    );
  if (forecast.isError && !forecast.data)
    return (
      <ErrorState
        title="The parts forecast didn't load"
        message={forecast.error.message}
        onRetry={() => forecast.refetch()}
        retrying={forecast.isRefetching}
      />
    );
  const f = forecast.data;
  return (
    <div className="flex flex-col gap-8" aria-busy={forecast.isPlaceholderData || undefined}>
      <div className="grid items-end gap-3 sm:grid-cols-3">
        <SelectField
          label="Horizon"
          options={HORIZONS}
          value={String(horizon)}
          onChange={(e) => onChange({ horizon: Number(e.target.value) })}
        />
        <SelectField
          label="Customer"
          options={[
            { value: '', label: 'All customers' },
            ...f.customers.map((c) => ({ value: c.id, label: c.name })),
          ]}
          value={customerId ?? ''}
          onChange={(e) => onChange({ customerId: e.target.value || null })}
        />
        <a
          className={buttonClasses('secondary')}
          href={partsCsvHref(orgId, horizon, customerId)}
          download
        >
          <Icon name="download" />
          Download CSV
        </a>
      </div>
      <p className="text-field-700">
        {f.services} {f.services === 1 ? 'service' : 'services'} due within {f.horizon} days (as of{' '}
        {dateText(f.asOf)}); overdue ones count as needed today.
        {f.undated > 0
          ? ` ${f.undated} more ${f.undated === 1 ? 'has' : 'have'} no forecast yet and ${f.undated === 1 ? 'is' : 'are'} left out.`
          : ''}{' '}
        Quantities come from each task&apos;s parts list; check them against the operator&apos;s
        manual.
      </p>
      <p className="text-field-700">{unitsText(f)}</p>
      {f.parts.length === 0 && f.fluids.length === 0 && f.wearParts.length === 0 ? (
        <EmptyState icon="check" title={`No parts needed in ${f.horizon} days`}>
          <p>Choose a longer horizon, or add parts lists to the farms&apos; service tasks.</p>
        </EmptyState>
      ) : (
        <>
          <Section title="All customers" description="Summed by part number, soonest first.">
            <Lines parts={f.parts} fluids={f.fluids} label="All customers" />
            <PartsWearTable lines={f.wearParts} label="All customers" />
          </Section>
          {f.byCustomer.map((c) => (
            <Section key={c.customer.id} title={c.customer.name}>
              <Lines parts={c.parts} fluids={c.fluids} label={c.customer.name} />
              <PartsWearTable lines={c.wearParts} label={c.customer.name} />
            </Section>
          ))}
        </>
      )}
    </div>
  );
}

// narrower cells on a phone, so the columns fit without scrolling; below 640 px the machine count
// moves under the part's name (a fourth column cut "First needed" off at 390 px)
const th = 'px-1.5 py-2 text-left text-sm font-bold text-field-700 sm:px-2.5';
const td = 'px-1.5 py-2.5 align-top break-words sm:px-2.5';
const wideOnly = 'hidden sm:table-cell';
const machinesText = (n: number) => (n === 1 ? '1 machine' : `${n} machines`);

/** Which stock units the fluids are summed in, and what happens to a unit not known. */
function unitsText(f: PartsForecast): string {
  const stock = f.units === 'imperial' ? 'US gallons and pounds' : 'litres and kilograms';
  return `Fluids in L, mL, US gal, US qt, kg, g or lb are converted and summed once each, in ${stock} (this organization's ${f.units} units); an amount in any other unit stays on its own line, marked "unit not converted", and is never added to the others.`;
}

/** "Fluid", "Fluid · from L and US gal", "Fluid · unit not converted". */
function fluidDetail(x: FluidLine): string {
  if (!x.converted) return 'Fluid · unit not converted';
  const from = x.summedFrom.map(stockUnitLabel);
  return from.length > 1 || from[0] !== stockUnitLabel(x.unit)
    ? `Fluid · from ${from.join(' and ')}`
    : 'Fluid';
}

function Lines({
  parts,
  fluids,
  label,
}: {
  parts: PartLine[];
  fluids: FluidLine[];
  label: string;
}) {
  if (parts.length === 0 && fluids.length === 0) return null;
  const lines = [
    ...parts.map((p) => ({
      key: `p:${p.partNumber}`,
      what: p.partNumber,
      detail: p.description,
      amount: number.format(p.quantity),
      unit: null,
      machines: p.machines,
      first: p.firstNeededOn,
    })),
    ...fluids.map((x) => ({
      key: `f:${x.kind}|${x.unit}`,
      what: x.kind,
      detail: fluidDetail(x),
      amount: number.format(x.volume),
      unit: stockUnitLabel(x.unit),
      machines: x.machines,
      first: x.firstNeededOn,
    })),
  ];
  return (
    <TableScroll label={`Parts and fluids: ${label}`}>
      <table className="w-full border-collapse">
        <caption className="sr-only">Parts and fluids: {label}</caption>
        <thead className="border-b border-field-200 bg-oat-100">
          <tr>
            <th scope="col" className={th}>
              Part or fluid
            </th>
            <th scope="col" className={`${th} text-right`}>
              Quantity
            </th>
            <th scope="col" className={`${th} ${wideOnly} text-right`}>
              Machines
            </th>
            <th scope="col" className={th}>
              First needed
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-field-100">
          {lines.map((l) => (
            <tr key={l.key}>
              <td className={td}>
                <span className="font-bold">{l.what}</span>
                {l.detail ? <span className="block text-sm text-field-600">{l.detail}</span> : null}
                <span className="block text-sm text-field-600 sm:hidden">
                  {machinesText(l.machines)}
                </span>
              </td>
              <td className={`${td} text-right tabular-nums`}>
                {l.amount}
                {/* "US gal" may go under the figure on a phone, never split in two */}
                {l.unit ? (
                  <>
                    {' '}
                    <span className="whitespace-nowrap">{l.unit}</span>
                  </>
                ) : null}
              </td>
              <td className={`${td} ${wideOnly} text-right tabular-nums`}>{l.machines}</td>
              <td className={`${td} whitespace-nowrap`}>{dateText(l.first)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </TableScroll>
  );
}
