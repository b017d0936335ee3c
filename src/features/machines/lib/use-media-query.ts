import { useCallback, useSyncExternalStore } from 'react';

/** Whether a CSS media query matches now, following changes (rotation, window resize). */
export function useMediaQuery(query: string): boolean {
  const subscribe = useCallback(
    (onChange: () => void) => {
      const list = window.matchMedia(query);
      list.addEventListener('change', onChange);
      return () => list.removeEventListener('change', onChange);
    },
    [query],
  );
  return useSyncExternalStore(
    subscribe,
    () => window.matchMedia(query).matches,
    () => false,
  );
}

/** The fleet shows a table from 1024 px up (the side navigation takes 224 px), cards below. */
export const WIDE_LAYOUT_QUERY = '(min-width: 1024px)';
