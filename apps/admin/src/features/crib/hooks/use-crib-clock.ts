import { useEffect, useState } from 'react';

/** The time now, renewed every minute, so "Due in 5 min" turns into "Overdue" while the page stays open. */
export function useCribClock(): Date {
  const [now, setNow] = useState(() => new Date());
  useEffect(() => {
    const timer = setInterval(() => setNow(new Date()), 60_000);
    return () => clearInterval(timer);
  }, []);
  return now;
}
