import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { boardKeys, useBoard } from '@/features/board/api/get-board';
import { BoardAreas } from '@/features/board/components/board-areas';
import { BoardClasses } from '@/features/board/components/board-classes';
import { BoardHeader } from '@/features/board/components/board-header';
import { hoursLine, supervisorLine } from '@/features/board/utils/board-text';
import { serverClockOffset } from '@/features/board/utils/server-clock';
import { ConnectionDot } from '@/features/connection/components/connection-dot';
import { useLiveLink } from '@/features/connection/hooks/use-live-link';
import { useShop } from '@/features/shop/api/get-shop';
import { PairScreen } from '@/features/station/components/pair-screen';
import { useNow } from '@/hooks/use-now';
import { isApiError } from '@/lib/api-client';

export function Component() {
  const queryClient = useQueryClient();
  const board = useBoard();
  const shop = useShop();
  const unpaired = isApiError(board.error, 401);
  const onHint = useCallback(() => void queryClient.invalidateQueries({ queryKey: boardKeys.all }), [queryClient]);
  const link = useLiveLink({ enabled: Boolean(board.data) && !unpaired, onHint });
  const now = useNow();

  if (board.data && !unpaired) {
    const { data } = board;
    const serverNow = new Date(now + serverClockOffset(data.generatedAt, board.dataUpdatedAt));
    return (
      // The board is a TV nobody scrolls: everything fits the screen, whatever its size.
      <div className="flex h-dvh flex-col overflow-hidden">
        <title>Board · Chuckkey</title>
        <BoardHeader
          shopName={data.shop.name}
          timeZone={data.shop.timeZone}
          hours={hoursLine(data.today)}
          supervisor={supervisorLine(data.supervisorOnDuty)}
          connection={<ConnectionDot status={link} />}
        />
        <main className="flex min-h-0 flex-1 flex-col">
          <BoardAreas areas={data.areas} now={serverNow} timeZone={data.shop.timeZone} />
        </main>
        <BoardClasses classes={data.classes} now={serverNow} timeZone={data.shop.timeZone} />
      </div>
    );
  }

  // Kiosk queries retry without end, so they never reach an error state; a failed try is the cue.
  const unreachable = !unpaired && board.failureCount > 0;
  return (
    <div className="flex h-dvh flex-col overflow-hidden">
      <title>Board · Chuckkey</title>
      <header className="bg-brand px-8 py-4 text-white">
        <p className="text-kiosk-body font-bold tracking-[0.12em] uppercase">Board</p>
      </header>
      <main className="flex min-h-0 flex-1 flex-col items-center justify-center gap-8 px-8 py-12">
        {unpaired && shop.data ? (
          <PairScreen shopName={shop.data.name} becomes="the shop’s wall board" />
        ) : unreachable ? (
          <p role="alert" className="text-kiosk-lead text-balance text-center">
            The shop’s server does not answer yet. This screen keeps trying.
          </p>
        ) : (
          <p className="text-kiosk-lead text-ink-muted">Loading…</p>
        )}
      </main>
    </div>
  );
}
