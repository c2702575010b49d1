import { useEffect, useEffectEvent } from 'react';

/**
 * Calls `onIdle` after `ms` without a touch, a click or a key: a station left mid-way returns to
 * its idle screen by itself, and nothing of the last person stays on it.
 */
export function useIdleReturn(ms: number, onIdle: () => void) {
  const fire = useEffectEvent(onIdle);

  useEffect(() => {
    let timer = setTimeout(() => fire(), ms);
    const restart = () => {
      clearTimeout(timer);
      timer = setTimeout(() => fire(), ms);
    };
    const events = ['pointerdown', 'keydown'] as const;
    for (const name of events) window.addEventListener(name, restart);
    return () => {
      clearTimeout(timer);
      for (const name of events) window.removeEventListener(name, restart);
    };
  }, [ms]);
}
