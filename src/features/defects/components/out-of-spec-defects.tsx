import { useState } from 'react';
import { Link } from 'react-router-dom';
import { specRangeWords } from '../../../../shared/domain/measurement-spec';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-client';
import { useDefects } from '../api/get-defects';
import { useReportDefect } from '../api/report-defect';

/** A measurement outside its spec, with the defect it would raise (shared/domain words). */
export interface OutOfSpecItem {
  /** the measurement's id on the record */
  id: string;
  name: string;
  value: number;
  unit: string;
  specMin: number | null;
  specMax: number | null;
  defect: { title: string; description: string };
}

const num = (n: number) => n.toLocaleString('en-US', { maximumFractionDigits: 4 });

function RaiseButton({
  orgId,
  machineId,
  item,
  alreadyOpen,
  defectsHref,
}: {
  orgId: string;
  machineId: string;
  item: OutOfSpecItem;
  alreadyOpen: boolean;
  defectsHref: string;
}) {
  const report = useReportDefect(orgId);
  const [raised, setRaised] = useState(false);
  if (raised || alreadyOpen)
    return (
      <p className="font-bold text-field-800">
        {raised ? 'Defect raised. ' : 'A defect for this is open. '}
        <Link to={defectsHref} className="underline">
          Open the defects
        </Link>{' '}
        to assign it or change its severity.
      </p>
    );
  return (
    <div className="flex flex-col gap-1">
      <Button
        variant="secondary"
        icon="alert"
        className="self-start"
        aria-label={`Raise a defect: ${item.name}`}
        pending={report.isPending}
        onClick={() =>
          report.mutate(
            { machineId, input: { ...item.defect, severity: 'major' } },
            { onSuccess: () => setRaised(true) },
          )
        }
      >
        Raise a defect
      </Button>
      {report.isError ? (
        <p role="alert" className="text-sm font-bold text-poppy-700">
          {isApiError(report.error)
            ? report.error.message
            : 'The defect was not raised. Try again.'}
        </p>
      ) : null}
    </div>
  );
}

/**
 * The record's measurements outside their spec, each with "Raise a defect": one tap raises a
 * major defect on the machine naming the measurement, its value and the spec (editable after on
 * the defects page). A defect of the same title still open is not raised twice.
 */
export function OutOfSpecDefects({
  orgId,
  machineId,
  items,
  defectsHref,
}: {
  orgId: string;
  machineId: string;
  items: OutOfSpecItem[];
  defectsHref: string;
}) {
  const open = useDefects(orgId, { status: 'active', machineId, page: 1 });
  if (!items.length) return null;
  const openTitles = new Set((open.data?.data ?? []).map((d) => d.title));
  return (
    <Alert
      tone="warning"
      title={`${items.length} ${items.length === 1 ? 'measurement is' : 'measurements are'} outside the spec`}
    >
      <ul aria-label="Outside the spec" className="mt-2 flex flex-col gap-3">
        {items.map((item) => (
          <li key={item.id} className="flex flex-col gap-1">
            <span>
              <span className="font-bold">{item.name}</span>: {num(item.value)}
              {item.unit ? ` ${item.unit}` : ''} against{' '}
              {specRangeWords(item.specMin, item.specMax, item.unit)}
            </span>
            <RaiseButton
              orgId={orgId}
              machineId={machineId}
              item={item}
              alreadyOpen={openTitles.has(item.defect.title)}
              defectsHref={defectsHref}
            />
          </li>
        ))}
      </ul>
    </Alert>
  );
}
