import type { SVGProps } from 'react';

// A small set of line icons drawn for Hourstone (24 × 24 grid, 2 px strokes). Icons decorate a
// text label; they are hidden from assistive technology unless given a title.

const PATHS = {
  gauge: (
    <>
      <path d="M4.5 17a8.5 8.5 0 1 1 15 0" />
      <path d="M12 13.5l4-4" />
      <circle cx="12" cy="14" r="1.2" />
      <path d="M7 17.5h10" />
    </>
  ),
  team: (
    <>
      <circle cx="9" cy="8.5" r="3" />
      <path d="M3.5 19c.6-3.2 2.8-5 5.5-5s4.9 1.8 5.5 5" />
      <circle cx="16.5" cy="9.5" r="2.3" />
      <path d="M16 14.2c2.3.2 4 1.7 4.5 4.8" />
    </>
  ),
  person: (
    <>
      <circle cx="12" cy="8" r="3.5" />
      <path d="M5 20c.8-4 3.6-6 7-6s6.2 2 7 6" />
    </>
  ),
  mail: (
    <>
      <rect x="3.5" y="5.5" width="17" height="13" rx="2" />
      <path d="M4 7l8 6 8-6" />
    </>
  ),
  alert: (
    <>
      <path d="M12 4l9 16H3l9-16z" />
      <path d="M12 10v4.5" />
      <path d="M12 17.3v.2" />
    </>
  ),
  error: (
    <>
      <circle cx="12" cy="12" r="8.5" />
      <path d="M12 7.5v5.5" />
      <path d="M12 16.3v.2" />
    </>
  ),
  info: (
    <>
      <circle cx="12" cy="12" r="8.5" />
      <path d="M12 11v5.5" />
      <path d="M12 7.7v.2" />
    </>
  ),
  check: (
    <>
      <circle cx="12" cy="12" r="8.5" />
      <path d="M8 12.3l2.7 2.7L16 9.5" />
    </>
  ),
  clock: (
    <>
      <circle cx="12" cy="12" r="8.5" />
      <path d="M12 7.5V12l3 2" />
    </>
  ),
  lock: (
    <>
      <rect x="5" y="10.5" width="14" height="9.5" rx="2" />
      <path d="M8 10.5V8a4 4 0 0 1 8 0v2.5" />
    </>
  ),
  close: (
    <>
      <path d="M6 6l12 12" />
      <path d="M18 6L6 18" />
    </>
  ),
  signOut: (
    <>
      <path d="M10 4.5H6a1.5 1.5 0 0 0-1.5 1.5v12A1.5 1.5 0 0 0 6 19.5h4" />
      <path d="M14 8l4 4-4 4" />
      <path d="M18 12H9.5" />
    </>
  ),
  plus: (
    <>
      <path d="M12 5v14" />
      <path d="M5 12h14" />
    </>
  ),
  trash: (
    <>
      <path d="M4.5 7h15" />
      <path d="M9.5 7V5h5v2" />
      <path d="M6.5 7l1 12.5h9l1-12.5" />
    </>
  ),
  field: (
    <>
      <path d="M3 18c3-2 6-3 9-3s6 1 9 3" />
      <path d="M5 14.5c2.3-1.4 4.6-2 7-2s4.7.6 7 2" />
      <path d="M12 3.5v6" />
      <path d="M12 6.5c-1.8 0-3-1.1-3.3-2.8 1.8 0 3 1 3.3 2.8z" />
      <path d="M12 6.5c1.8 0 3-1.1 3.3-2.8-1.8 0-3 1-3.3 2.8z" />
    </>
  ),
  external: (
    <>
      <path d="M13.5 5H19v5.5" />
      <path d="M19 5l-8 8" />
      <path d="M17 14v4.5a1.5 1.5 0 0 1-1.5 1.5h-10A1.5 1.5 0 0 1 4 18.5v-10A1.5 1.5 0 0 1 5.5 7H10" />
    </>
  ),
  back: (
    <>
      <path d="M14.5 6l-6 6 6 6" />
    </>
  ),
  refresh: (
    <>
      <path d="M19 12a7 7 0 1 1-2.1-5" />
      <path d="M19 4.5V8h-3.5" />
    </>
  ),
  wrench: (
    <>
      <path d="M14.5 4.2a4.5 4.5 0 0 0-5.3 6L4.6 14.8a2 2 0 0 0 2.8 2.8l4.6-4.6a4.5 4.5 0 0 0 6-5.3l-2.7 2.7-2.5-.6-.6-2.5 2.3-3.1z" />
    </>
  ),
  store: (
    <>
      <path d="M4 9.5l1.5-5h13l1.5 5" />
      <path d="M4 9.5c0 1.4 1.1 2.5 2.7 2.5s2.6-1.1 2.6-2.5c0 1.4 1.1 2.5 2.7 2.5s2.7-1.1 2.7-2.5c0 1.4 1 2.5 2.6 2.5S20 10.9 20 9.5" />
      <path d="M5.5 12v7.5h13V12" />
      <path d="M10 19.5v-4.5h4v4.5" />
    </>
  ),
  send: (
    <>
      <path d="M20 4L3.5 10.5l7 3 3 7L20 4z" />
      <path d="M20 4l-9.5 9.5" />
    </>
  ),
  download: (
    <>
      <path d="M12 4v11" />
      <path d="M7.5 10.5L12 15l4.5-4.5" />
      <path d="M5 19.5h14" />
    </>
  ),
  box: (
    <>
      <path d="M12 3.5l8 4v9l-8 4-8-4v-9l8-4z" />
      <path d="M4 7.5l8 4 8-4" />
      <path d="M12 11.5v9" />
    </>
  ),
  list: (
    <>
      <path d="M9.5 7h10" />
      <path d="M9.5 12h10" />
      <path d="M9.5 17h10" />
      <path d="M4.5 7l1 1 1.8-2" />
      <path d="M4.5 12l1 1 1.8-2" />
      <path d="M4.5 17l1 1 1.8-2" />
    </>
  ),
  sliders: (
    <>
      <path d="M4 7h9" />
      <path d="M17 7h3" />
      <circle cx="15" cy="7" r="2" />
      <path d="M4 17h3" />
      <path d="M11 17h9" />
      <circle cx="9" cy="17" r="2" />
    </>
  ),
  calendar: (
    <>
      <rect x="4" y="5.5" width="16" height="14.5" rx="2" />
      <path d="M4 10h16" />
      <path d="M8.5 3.5v4" />
      <path d="M15.5 3.5v4" />
    </>
  ),
  // bars side by side: a season's hours against the last (Season hours)
  bars: (
    <>
      <path d="M4 20h16" />
      <path d="M7 20v-7" />
      <path d="M11 20V8" />
      <path d="M15 20v-9" />
      <path d="M19 20V5" />
    </>
  ),
  printer: (
    <>
      <path d="M7 9V4h10v5" />
      <rect x="4" y="9" width="16" height="7.5" rx="1.5" />
      <path d="M7 14h10v6H7z" />
    </>
  ),
} as const;

export type IconName = keyof typeof PATHS;

interface IconProps extends Omit<SVGProps<SVGSVGElement>, 'name'> {
  name: IconName;
  /** Give a title only when the icon stands alone and carries meaning. */
  title?: string;
}

export function Icon({ name, title, className = 'size-5', ...rest }: IconProps) {
  return (
    <svg
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      className={`shrink-0 ${className}`}
      aria-hidden={title ? undefined : true}
      role={title ? 'img' : undefined}
      focusable="false"
      data-icon={name}
      {...rest}
    >
      {title ? <title>{title}</title> : null}
      {PATHS[name]}
    </svg>
  );
}
