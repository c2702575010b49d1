import { useEffect, useState } from 'react';

/** The current time, renewed on an interval, so that words like "2 minutes ago" keep up while a page stays open. */
export function useNow(everyMs: number): Date {
  const [now, setNow] = useState(() => new Date());
  useEffect(() => {
    const timer = setInterval(() => setNow(new Date()), everyMs);
    return () => clearInterval(timer);
  }, [everyMs]);
  return now;
}
