import { useEffect, useId, useRef, useState } from 'react';
import { NavLink, useLocation } from 'react-router-dom';
import { useMediaQuery } from '../../lib/use-media-query';
import { cx } from '../ui/cx';
import { Icon, type IconName } from '../ui/icons';

export interface MainNavItem {
  label: string;
  href: string;
  icon: IconName;
  /** match only this exact path (the organization's home), not everything below it */
  end?: boolean;
}

/** Items in the phone's bottom bar; the rest open from "More". Four leave each a thumb's width. */
const PHONE_BAR_ITEMS = 4;

const isCurrent = (item: MainNavItem, pathname: string) =>
  pathname === item.href || (!item.end && pathname.startsWith(`${item.href}/`));

/**
 * The one navigation landmark ("Main"). From 640 px up it is a side bar listing every item. On
 * phones it is a bottom bar within thumb reach: the role's first items, then "More", which opens
 * a panel inside the same landmark with the rest (rendered only while open, so a closed panel
 * holds no hidden links). NavLink sets aria-current="page" on the active item.
 */
export function MainNav({ items }: { items: MainNavItem[] }) {
  const wide = useMediaQuery('(min-width: 640px)');
  const { pathname } = useLocation();
  const [open, setOpen] = useState(false);
  const [openedAt, setOpenedAt] = useState(pathname);
  const navRef = useRef<HTMLElement>(null);
  const moreRef = useRef<HTMLButtonElement>(null);
  const panelId = useId();

  // One item more than the bar holds fits in place of the "More" button.
  const overflow = !wide && items.length > PHONE_BAR_ITEMS + 1;
  const barItems = overflow ? items.slice(0, PHONE_BAR_ITEMS) : items;
  const moreItems = overflow ? items.slice(PHONE_BAR_ITEMS) : [];
  const moreCurrent = moreItems.some((item) => isCurrent(item, pathname));

  // Following a link closes the panel (adjusting state during render, as React advises).
  if (openedAt !== pathname) {
    setOpenedAt(pathname);
    if (open) setOpen(false);
  }
  const panelOpen = open && overflow;

  useEffect(() => {
    if (!panelOpen) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key !== 'Escape') return;
      setOpen(false);
      moreRef.current?.focus();
    };
    const onPointer = (event: PointerEvent) => {
      if (!navRef.current?.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener('keydown', onKey);
    document.addEventListener('pointerdown', onPointer);
    return () => {
      document.removeEventListener('keydown', onKey);
      document.removeEventListener('pointerdown', onPointer);
    };
  }, [panelOpen]);

  return (
    <nav
      ref={navRef}
      aria-label="Main"
      className={cx(
        'fixed inset-x-0 bottom-0 z-30 border-t border-field-200 bg-white/95 pb-[env(safe-area-inset-bottom)] backdrop-blur print:hidden',
        'sm:sticky sm:top-16 sm:bottom-auto sm:z-auto sm:h-[calc(100dvh-4rem)] sm:overflow-y-auto sm:border-t-0 sm:bg-transparent sm:pb-0 sm:backdrop-blur-none',
      )}
    >
      <ul className="flex sm:flex-col sm:gap-1 sm:p-3">
        {barItems.map((item) => (
          <li key={item.href} className="min-w-0 flex-1 sm:flex-none">
            <MainNavLink item={item} />
          </li>
        ))}
        {overflow ? (
          <li className="min-w-0 flex-1">
            <button
              ref={moreRef}
              type="button"
              aria-expanded={panelOpen}
              aria-controls={panelId}
              onClick={() => setOpen((was) => !was)}
              className={cx(
                'flex min-h-14 w-full flex-col items-center justify-center gap-0.5 px-0 py-1.5 text-[0.75rem] font-bold tracking-tight',
                moreCurrent || panelOpen ? 'text-field-950' : 'text-field-600',
              )}
            >
              <span
                className={cx(
                  'flex h-7 w-12 items-center justify-center rounded-full',
                  moreCurrent && 'bg-straw-200',
                )}
              >
                {panelOpen ? <Icon name="close" className="size-5" /> : <MoreIcon />}
              </span>
              <span className="leading-tight">More</span>
            </button>
          </li>
        ) : null}
      </ul>
      {panelOpen ? (
        <div
          id={panelId}
          className="absolute inset-x-0 bottom-full max-h-[70dvh] overflow-y-auto border-t border-field-200 bg-white p-3 shadow-[0_-8px_24px_rgb(31_42_35/0.12)]"
        >
          <ul className="grid grid-cols-2 gap-2">
            {moreItems.map((item) => (
              <li key={item.href}>
                <NavLink
                  to={item.href}
                  end={item.end}
                  className={({ isActive }) =>
                    cx(
                      'flex min-h-12 items-center gap-3 rounded-lg border px-3 py-2 font-bold',
                      isActive
                        ? 'border-field-800 bg-field-800 text-oat-50'
                        : 'border-field-200 text-field-800 hover:bg-field-50',
                    )
                  }
                >
                  <Icon name={item.icon} className="size-5 shrink-0" />
                  <span className="min-w-0">{item.label}</span>
                </NavLink>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </nav>
  );
}

function MainNavLink({ item }: { item: MainNavItem }) {
  return (
    <NavLink
      to={item.href}
      end={item.end}
      className={({ isActive }) =>
        cx(
          'flex min-h-14 flex-col items-center justify-center gap-0.5 px-0 py-1.5 text-center text-[0.75rem] font-bold tracking-tight sm:min-h-touch sm:tracking-normal sm:flex-row sm:justify-start sm:gap-3 sm:rounded-lg sm:px-3 sm:text-left sm:text-base',
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
          <span className="max-w-full leading-tight">{item.label}</span>
        </>
      )}
    </NavLink>
  );
}

/** Three dots: "more of the same" (drawn here; it has no other use in the app). */
function MoreIcon() {
  return (
    <svg viewBox="0 0 24 24" aria-hidden="true" className="size-5" fill="currentColor">
      <circle cx="5.5" cy="12" r="1.8" />
      <circle cx="12" cy="12" r="1.8" />
      <circle cx="18.5" cy="12" r="1.8" />
    </svg>
  );
}
