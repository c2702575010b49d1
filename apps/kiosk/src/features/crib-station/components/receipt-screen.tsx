import type { CribCheckout } from '@chuckkey/core';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { useFocusOnMount } from '@/hooks/use-focus-on-mount';
import { useIdleReturn } from '@/hooks/use-idle-return';
import { dueBackLine } from '../utils/due-text';
import type { BasketLine } from '../utils/basket';

// screens.md: an outcome returns to idle by itself after 20 seconds without a touch.
export const RECEIPT_IDLE_MS = 20_000;

/** What went out with whom, and when it is due back; then the station is ready for the next person. */
export function ReceiptScreen({
  firstName,
  checkouts,
  lines,
  timeZone,
  onDone,
}: {
  firstName: string;
  checkouts: CribCheckout[];
  lines: BasketLine[];
  timeZone: string;
  onDone: () => void;
}) {
  useIdleReturn(RECEIPT_IDLE_MS, onDone);
  const heading = useFocusOnMount<HTMLHeadingElement>();
  const now = new Date();
  const dues = checkouts.flatMap((checkout) => (checkout.dueAt ? [checkout.dueAt] : [])).sort();
  const firstDue = dues[0];
  const unit = (itemId: string) => {
    const line = lines.find((candidate) => candidate.itemId === itemId);
    return line?.kind === 'consumable' ? line.unit : '';
  };

  return (
    <div role="status" className="flex w-full max-w-4xl flex-col items-center gap-6 text-center">
      <Icon name="check" className="size-20 text-link-up" />
      <h1 ref={heading} tabIndex={-1} className="text-kiosk-title font-bold focus:outline-none">
        Checked out, {firstName}
      </h1>
      {firstDue ? <p className="text-kiosk-lead font-bold">{dueBackLine(firstDue, now, timeZone)}</p> : null}
      <ul className="flex w-full flex-col gap-3 text-left">
        {checkouts.map((checkout) => (
          <li key={checkout.id} className="flex flex-wrap items-baseline justify-between gap-x-6 gap-y-1 rounded-xl border-2 border-ink-muted px-5 py-3 text-kiosk-body">
            <span className="font-bold">{checkout.itemKind === 'tool' ? checkout.itemName : `${checkout.quantity} ${unit(checkout.itemId)} · ${checkout.itemName}`}</span>
            <span>{checkout.dueAt ? dueBackLine(checkout.dueAt, now, timeZone) : 'Taken from stock'}</span>
          </li>
        ))}
      </ul>
      <p className="text-kiosk-body text-balance">Bring tools back here and scan them under “Return items”.</p>
      <Button onClick={onDone}>Done</Button>
    </div>
  );
}
