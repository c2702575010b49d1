import { BoardAwaitingPairing } from '@/features/board/components/board-awaiting-pairing';
import { BoardHeader } from '@/features/board/components/board-header';
import { ConnectionDot } from '@/features/connection/components/connection-dot';
import { useShop } from '@/features/shop/api/get-shop';

export function Component() {
  const shop = useShop();

  return (
    // The board is a TV nobody scrolls: everything fits the screen, whatever its size.
    <div className="flex h-dvh flex-col overflow-hidden">
      <title>Board · Chuckkey</title>
      <BoardHeader
        shopName={shop.data?.name ?? 'Chuckkey'}
        timeZone={shop.data?.timeZone}
        connection={<ConnectionDot />}
      />
      <main className="min-h-0 flex-1">
        <BoardAwaitingPairing />
      </main>
    </div>
  );
}
