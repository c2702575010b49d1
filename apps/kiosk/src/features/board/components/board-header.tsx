import type { ReactNode } from 'react';
import { ShopClock } from './shop-clock';

interface BoardHeaderProps {
  shopName: string;
  timeZone: string | undefined;
  connection: ReactNode;
}

export function BoardHeader({ shopName, timeZone, connection }: BoardHeaderProps) {
  return (
    <header className="flex items-center gap-[2vw] bg-brand px-[2.5vw] py-[1.6vh] text-white">
      <h1 className="min-w-0 flex-1 truncate text-board-strip font-bold">{shopName}</h1>
      {timeZone ? <ShopClock timeZone={timeZone} /> : null}
      {connection}
    </header>
  );
}
