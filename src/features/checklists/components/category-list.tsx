import { Link } from 'react-router-dom';
import {
  CATEGORY_LABELS,
  MACHINE_CATEGORIES,
  type MachineCategory,
} from '../../../../shared/constants';
import { cx } from '../../../components/ui/cx';
import type { ChecklistTemplate } from '../api/types';

/** Every machine category with the list its walkarounds use: the farm's own, or the built-in one. */
export function CategoryList({
  templates,
  current,
  hrefFor,
}: {
  templates: ChecklistTemplate[];
  current: MachineCategory;
  hrefFor: (category: MachineCategory) => string;
}) {
  return (
    <nav aria-label="Machine categories">
      <ul className="grid grid-cols-2 gap-2 sm:grid-cols-3 lg:grid-cols-1">
        {MACHINE_CATEGORIES.map((category) => {
          const template = templates.find((t) => t.category === category);
          const active = category === current;
          return (
            <li key={category}>
              <Link
                to={hrefFor(category)}
                aria-current={active ? 'page' : undefined}
                className={cx(
                  'flex min-h-12 flex-col justify-center rounded-lg border px-3 py-2',
                  active
                    ? 'border-field-800 bg-field-800 text-oat-50'
                    : 'border-field-200 bg-white text-field-900 hover:border-field-400',
                )}
              >
                <span className="font-bold">{CATEGORY_LABELS[category]}</span>
                <span className={cx('text-sm', active ? 'text-oat-100' : 'text-field-600')}>
                  {template ? `Farm list · ${template.items.length} items` : 'Built-in list'}
                </span>
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
