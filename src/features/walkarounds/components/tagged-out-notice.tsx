import { Link } from 'react-router-dom';
import { buttonClasses } from '../../../components/ui/button';
import { Icon } from '../../../components/ui/icons';
import { TagOutExplanation } from './tag-out-explanation';

/** The walkaround for use was refused: the machine is tagged out. Said plainly, with the way on. */
export function TaggedOutNotice({
  orgId,
  machineId,
  timeZone,
  message,
  pickHref,
  defectsHref,
  inspectHref,
}: {
  orgId: string;
  machineId: string;
  timeZone: string;
  message: string;
  pickHref: string;
  defectsHref: string;
  /** technicians and managers may inspect a tagged-out machine in the shop */
  inspectHref: string | null;
}) {
  return (
    <div className="flex flex-col gap-5">
      <div
        role="alert"
        className="flex gap-3 rounded-xl border-4 border-poppy-700 bg-poppy-50 p-5 text-poppy-900"
      >
        <Icon name="lock" className="mt-1 size-8 shrink-0 text-poppy-700" />
        <div className="flex flex-col gap-1">
          <p className="text-xl font-black">Tagged out — do not use</p>
          <p className="text-lg font-bold">{message}.</p>
        </div>
      </div>
      <TagOutExplanation orgId={orgId} machineId={machineId} timeZone={timeZone} />
      <div className="flex flex-col gap-2 sm:flex-row">
        <Link to={pickHref} className={buttonClasses('primary', 'min-h-12')}>
          Pick another machine
        </Link>
        <Link to={defectsHref} className={buttonClasses('secondary', 'min-h-12')}>
          See its defects
        </Link>
        {inspectHref ? (
          <Link to={inspectHref} className={buttonClasses('secondary', 'min-h-12')}>
            Do a shop inspection instead
          </Link>
        ) : null}
      </div>
    </div>
  );
}
