import { useEffect, useRef } from 'react';

/**
 * Moves focus to the element when its screen appears (give it tabIndex -1), so a screen reader
 * announces the new screen and the keyboard starts from its top, not from a control now gone.
 */
export function useFocusOnMount<T extends HTMLElement>() {
  const ref = useRef<T>(null);
  useEffect(() => {
    ref.current?.focus();
  }, []);
  return ref;
}
