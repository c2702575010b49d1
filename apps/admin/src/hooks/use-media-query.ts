import { useCallback, useSyncExternalStore } from 'react';

/** Some layouts differ in structure, not only in style, between a phone and a wide screen. */
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

export const WIDE_SCREEN = '(min-width: 48rem)';
