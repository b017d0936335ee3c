import { Link } from 'react-router-dom';
import { DEFECT_SEVERITY_LABELS, type DefectSeverity } from '../../../../shared/schemas/defects';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { buttonClasses } from '../../../components/ui/button';
import { Icon, type IconName } from '../../../components/ui/icons';
import type { RaisedDefect, WalkaroundOutcome } from '../api/types';
import { CareSignedOffNote } from './daily-care-checks';

const SEVERITY: Record<DefectSeverity, { tone: BadgeTone; icon: IconName }> = {
  critical: { tone: 'overdue', icon: 'lock' },
  major: { tone: 'due-soon', icon: 'error' },
  minor: { tone: 'info', icon: 'alert' },
};

/** What the operator sees once the server has the walkaround. */
export function WalkaroundOutcomeView({
  outcome,
  pickHref,
  defectsHref,
}: {
  outcome: WalkaroundOutcome;
  pickHref: string;
  defectsHref: string;
}) {
  const { machine } = outcome;
  const { counts } = outcome.data;
  const summary = [
    `${counts.ok} OK`,
    counts.attention ? `${counts.attention} needing attention` : null,
    counts.fail ? `${counts.fail} failed` : null,
  ]
    .filter(Boolean)
    .join(', ');

  return (
    <div className="flex flex-col gap-5">
      {outcome.taggedOut ? (
        <div
          role="alert"
          className="flex gap-3 rounded-xl border-4 border-poppy-700 bg-poppy-50 p-5 text-poppy-900"
        >
          <Icon name="lock" className="mt-1 size-8 shrink-0 text-poppy-700" />
          <p className="flex flex-col gap-1">
            <span className="text-2xl font-black">Do not use {machine.fleetNumber}.</span>{' '}
            <span className="text-lg font-bold">
              It is tagged out until a technician or manager clears it.
            </span>
          </p>
        </div>
      ) : (
        <div
          role="status"
          className="flex gap-3 rounded-xl border-2 border-clover-300 bg-clover-50 p-5 text-clover-900"
        >
          <Icon name="check" className="mt-0.5 size-7 shrink-0 text-clover-700" />
          <div>
            <p className="text-xl font-black">Walkaround sent</p>
            <p>
              {machine.fleetNumber} {machine.name}: {summary}.
            </p>
          </div>
        </div>
      )}
      {outcome.taggedOut ? (
        <p className="text-field-800">
          Your walkaround of {machine.fleetNumber} was sent ({summary}). Leave the machine parked
          and tell whoever plans the work today.
        </p>
      ) : null}
      {outcome.duplicate ? (
        <p className="text-sm text-field-600">
          Hourstone already had this walkaround, so it was not recorded twice.
        </p>
      ) : null}
      <CareSignedOffNote care={outcome.data.careDone ?? []} />
      {outcome.defects.length > 0 ? <RaisedDefects defects={outcome.defects} /> : null}
      <div className="flex flex-col gap-2 sm:flex-row">
        <Link to={pickHref} className={buttonClasses('primary', 'min-h-12')}>
          Walk round another machine
        </Link>
        <Link to={defectsHref} className={buttonClasses('secondary', 'min-h-12')}>
          {machine.fleetNumber} defects
        </Link>
      </div>
    </div>
  );
}

function RaisedDefects({ defects }: { defects: RaisedDefect[] }) {
  return (
    <section aria-labelledby="raised-defects" className="flex flex-col gap-2">
      <h2 id="raised-defects" className="text-lg font-black text-field-900">
        Reported to the shop
      </h2>
      <ul className="flex flex-col gap-2">
        {defects.map((defect) => (
          <li
            key={defect.id}
            className="flex flex-col gap-1 rounded-lg border border-field-200 bg-white p-3"
          >
            <div className="flex flex-wrap items-center gap-2">
              <Badge tone={SEVERITY[defect.severity].tone} icon={SEVERITY[defect.severity].icon}>
                {DEFECT_SEVERITY_LABELS[defect.severity]}
              </Badge>
              <span className="font-bold">{defect.title}</span>
            </div>
            {defect.description ? (
              <p className="text-sm text-field-700">{defect.description}</p>
            ) : null}
            {defect.reportCount > 1 ? (
              <p className="text-sm text-field-600">
                Already reported: this adds to the open defect ({defect.reportCount} reports).
              </p>
            ) : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
