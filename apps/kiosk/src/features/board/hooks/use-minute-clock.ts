import { useEffect, useState } from 'react';

/** The current instant, refreshed on each minute boundary (the board shows hours and minutes). */
export function useMinuteClock(): Date {
  const [now, setNow] = useState(() => new Date());

  useEffect(() => {
    let timer: ReturnType<typeof setTimeout>;
    // Re-aim at the next boundary every time, so a sleeping screen or a slow timer never drifts.
    const schedule = () => {
      timer = setTimeout(() => {
        setNow(new Date());
        schedule();
      }, 60_000 - (Date.now() % 60_000));
    };
    schedule();
    return () => clearTimeout(timer);
  }, []);

  return now;
}
