import type { ReactNode } from 'react';
import { Icon } from '@/components/ui/icon';
import { ShopClock } from './shop-clock';

interface BoardHeaderProps {
  shopName: string;
  timeZone: string;
  hours: string;
  supervisor: string;
  connection: ReactNode;
}

/** The strip across the top: whose shop, today's hours, who supervises, the time, and the link. */
export function BoardHeader({ shopName, timeZone, hours, supervisor, connection }: BoardHeaderProps) {
  return (
    <header className="flex items-center gap-[2vw] bg-brand px-[2.5vw] py-[1.2vh] text-white">
      <div className="flex min-w-0 flex-1 flex-col">
        <h1 className="truncate text-board-strip font-bold">{shopName}</h1>
        <p className="truncate text-board-fact text-ink-muted">{hours}</p>
      </div>
      <p className="flex items-center gap-[0.4em] text-board-fact font-bold whitespace-nowrap">
        <Icon name="person" className="size-[1.3em]" />
        {supervisor}
      </p>
      <ShopClock timeZone={timeZone} />
      {connection}
    </header>
  );
}
