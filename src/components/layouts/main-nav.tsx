import { NavLink } from 'react-router-dom';
import { cx } from '../ui/cx';
import { Icon, type IconName } from '../ui/icons';

export interface MainNavItem {
  label: string;
  href: string;
  icon: IconName;
  /** match only this exact path (the organization's home), not everything below it */
  end?: boolean;
}

/**
 * The one navigation landmark ("Main"). On phones it is a bottom tab bar within thumb reach; from
 * 640 px up it is a side bar. NavLink sets aria-current="page" on the active item.
 */
export function MainNav({ items }: { items: MainNavItem[] }) {
  return (
    <nav
      aria-label="Main"
      className={cx(
        'fixed inset-x-0 bottom-0 z-30 border-t border-field-200 bg-white/95 pb-[env(safe-area-inset-bottom)] backdrop-blur',
        'sm:sticky sm:top-16 sm:bottom-auto sm:z-auto sm:h-[calc(100dvh-4rem)] sm:border-t-0 sm:bg-transparent sm:pb-0 sm:backdrop-blur-none',
      )}
    >
      <ul className="flex overflow-x-auto sm:flex-col sm:gap-1 sm:overflow-visible sm:p-3">
        {items.map((item) => (
          <li key={item.href} className="min-w-[4.5rem] flex-1 sm:flex-none">
            <NavLink
              to={item.href}
              end={item.end}
              className={({ isActive }) =>
                cx(
                  'flex min-h-14 flex-col items-center justify-center gap-0.5 px-2 py-1.5 text-xs font-bold sm:min-h-touch sm:flex-row sm:justify-start sm:gap-3 sm:rounded-lg sm:px-3 sm:text-base',
                  isActive
                    ? 'text-field-950 sm:bg-field-800 sm:text-oat-50'
                    : 'text-field-600 hover:text-field-900 sm:hover:bg-field-100',
                )
              }
            >
              {({ isActive }) => (
                <>
                  <span
                    className={cx(
                      'flex h-7 w-12 items-center justify-center rounded-full sm:h-auto sm:w-auto',
                      // on the phone bar the active item gets a pill as well as bold text
                      isActive && 'bg-straw-200 sm:bg-transparent',
                    )}
                  >
                    <Icon name={item.icon} className="size-5" />
                  </span>
                  <span>{item.label}</span>
                </>
              )}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
