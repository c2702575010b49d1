import { useMinuteClock } from '../hooks/use-minute-clock';
import { formatShopDate, formatShopTime } from '../utils/shop-clock';

export function ShopClock({ timeZone }: { timeZone: string }) {
  const now = useMinuteClock();
  return (
    <p className="flex flex-col items-end whitespace-nowrap">
      <time dateTime={now.toISOString()} className="text-board-clock font-bold tabular-nums">
        {formatShopTime(now, timeZone)}
      </time>
      <span className="text-board-fact text-ink-muted">{formatShopDate(now, timeZone)}</span>
    </p>
  );
}
