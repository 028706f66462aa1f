'use client';

import { useCallback, useSyncExternalStore } from 'react';

/** Narrower than Tailwind's `md` (48rem): the phone layouts. Kept beside the `md:` classes that hide the wide ones. */
export const PHONE_QUERY = '(max-width: 767.98px)';

/**
 * Whether a media query matches, following changes (a rotated phone). The server and the first client render say
 * `serverValue`, so hydration agrees; CSS classes cover the first paint where the two layouts differ.
 */
export function useMediaQuery(query: string, serverValue = false): boolean {
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
    () => serverValue,
  );
}

/** A phone-sized viewport: read-only route page, cards instead of the routes table. */
export function useIsPhone(): boolean {
  return useMediaQuery(PHONE_QUERY);
}
