import { Link } from 'react-router-dom';
import { buttonClasses } from '../../components/ui/button';
import { Icon } from '../../components/ui/icons';
import type { MachineDetail } from '../../../shared/schemas/machines';
import { paths } from '../paths';

const SECTIONS = [
  { id: 'due', label: 'Due' },
  { id: 'hitch', label: 'Hitch log' },
  { id: 'history', label: 'History' },
  { id: 'meter', label: 'Meters' },
  { id: 'measurements', label: 'Measurements' },
  { id: 'spec', label: 'Spec sheet' },
  { id: 'readings', label: 'Readings' },
  { id: 'details', label: 'Details' },
] as const;

/** The machine page's links to other pages: the walkaround, its label, its defects. */
export function MachineLinks({
  orgId,
  machine,
  isShop,
  defectsHref,
}: {
  orgId: string;
  machine: MachineDetail['data'];
  /** a manager or technician: may walk round a tagged-out machine to inspect it */
  isShop: boolean;
  defectsHref: string;
}) {
  const org = paths.organization;
  return (
    <ul aria-label="For this machine" className="-mt-4 flex flex-wrap gap-2">
      {machine.status === 'in_service' || (machine.status === 'tagged_out' && isShop) ? (
        <li>
          <Link
            to={org.walkaround.href(
              orgId,
              machine.id,
              machine.status === 'tagged_out' ? 'inspection' : 'use',
            )}
            className={buttonClasses('secondary')}
          >
            <Icon name="check" />
            {machine.status === 'tagged_out' ? 'Inspection walkaround' : 'Daily walkaround'}
          </Link>
        </li>
      ) : null}
      <li>
        <Link to={org.machineLabel.href(orgId, machine.id)} className={buttonClasses('secondary')}>
          <Icon name="printer" />
          Print label
        </Link>
      </li>
      <li>
        <Link to={defectsHref} className={buttonClasses('secondary')}>
          <Icon name="alert" />
          Defects
        </Link>
      </li>
    </ul>
  );
}

/** "On this page": a jump to each section (the hitch log only for machines that hitch). */
export function MachinePageNav({ hitched }: { hitched: boolean }) {
  return (
    <nav aria-label="On this page" className="-mt-2">
      <ul className="flex flex-wrap gap-2">
        {SECTIONS.filter((s) => s.id !== 'hitch' || hitched).map((s) => (
          <li key={s.id}>
            <a
              href={`#${s.id}`}
              className="inline-flex min-h-touch items-center rounded-full border border-field-300 bg-white px-4 font-bold text-field-800 hover:bg-field-50"
            >
              {s.label}
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}
