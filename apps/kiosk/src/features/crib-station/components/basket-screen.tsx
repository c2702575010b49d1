import type { CribCheckout, CribStationOut } from '@chuckkey/core';
import { useState } from 'react';
import { useFocusOnMount } from '@/hooks/use-focus-on-mount';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { isApiError } from '@/lib/api-client';
import { useCheckOutBasket } from '../api/check-out-basket';
import { lookupCribTag, useLookupCribTag } from '../api/lookup-crib-tag';
import { addTool, basketRequest, canConfirm, markLine, quantityOf, removeLine, setConsumable, type BasketLine } from '../utils/basket';
import { cribMessage, refusedLine } from '../utils/crib-messages';
import { dueBackLine, outLine, outToLine } from '../utils/due-text';
import { ConsumablePicker } from './consumable-picker';
import { CribCaution } from './crib-caution';
import { IdleTimer } from './idle-timer';
import type { CribScanners } from './scanners';
import { TagReader } from './tag-reader';

// As long as a machine's safety check: the member is at work on the screen, fetching tools.
export const BASKET_IDLE_MS = 90_000;

interface Announcement {
  text: string;
  problem: boolean;
}

/** After the member's badge: what they have out, and a basket that fills as tags are scanned. */
export function BasketScreen({
  member,
  out,
  timeZone,
  Camera,
  onCheckedOut,
  onCancel,
}: {
  member: { firstName: string; badge: string };
  out: CribStationOut[];
  timeZone: string;
  Camera: CribScanners['Camera'];
  onCheckedOut: (checkouts: CribCheckout[], lines: BasketLine[]) => void;
  onCancel: () => void;
}) {
  const [lines, setLines] = useState<BasketLine[]>([]);
  const [picking, setPicking] = useState(false);
  const [announcement, setAnnouncement] = useState<Announcement | null>(null);
  const [scans, setScans] = useState(0);
  const lookup = useLookupCribTag();
  const checkout = useCheckOutBasket();
  const now = new Date();
  const heading = useFocusOnMount<HTMLHeadingElement>();

  const onTag = (tag: string) => {
    setScans((count) => count + 1);
    // The badge that opened the basket is often still in front of the camera: it is no tool's tag.
    if (tag === member.badge) return;
    lookup.mutate(tag, {
      onSuccess: ({ item }) => {
        // The basket may have changed while the tag was looked up: the line goes into the basket as it is now.
        setLines((current) => addTool(current, item, new Date(), timeZone).lines);
        const result = addTool(lines, item, new Date(), timeZone);
        const line = result.lines.find((candidate) => candidate.itemId === item.id);
        if (result.added === 'already_in_basket') setAnnouncement({ text: `${item.name} is already in the basket.`, problem: false });
        else if (result.added === 'not_available') setAnnouncement({ text: `${item.name}: ${line?.problem ?? ''}`, problem: true });
        else setAnnouncement({ text: `Added ${item.name}. ${dueBackLine(item.dueAt, new Date(), timeZone)}.`, problem: false });
      },
      onError: (error) => setAnnouncement({ text: cribMessage(error), problem: true }),
    });
  };

  const markRefused = async (error: unknown) => {
    const itemId = refusedLine(error);
    const line = lines.find((candidate) => candidate.itemId === itemId);
    if (!itemId || !line) {
      setAnnouncement({ text: cribMessage(error), problem: true });
      return;
    }
    let words = cribMessage(error);
    // Who took it meanwhile says more than "someone": the tag is looked up again for the name.
    if (line.kind === 'tool' && isApiError(error) && error.code === 'already_out') {
      const fresh = await lookupCribTag(line.assetTag).catch(() => null);
      const open = fresh?.item.openCheckout;
      if (open) words = outToLine(open.memberFirstName, open.dueAt, new Date(), timeZone);
    }
    setLines((current) => markLine(current, itemId, words));
    setAnnouncement({ text: `${line.name}: ${words}`, problem: true });
  };

  const confirm = () => {
    setAnnouncement(null);
    checkout.mutate(
      { badge: member.badge, items: basketRequest(lines) },
      {
        onSuccess: ({ checkouts }) => onCheckedOut(checkouts, lines),
        onError: (error) => void markRefused(error),
      },
    );
  };

  const overdue = out.filter((checkout) => checkout.overdue).length;

  return (
    <div className="flex w-full max-w-6xl flex-col gap-6">
      <IdleTimer key={scans} ms={BASKET_IDLE_MS} onIdle={onCancel} />
      <h1 ref={heading} tabIndex={-1} className="flex items-center gap-5 text-kiosk-title font-bold focus:outline-none">
        <Icon name="person" className="size-16 shrink-0" />
        Hello, {member.firstName}
      </h1>

      <section aria-labelledby="out-heading" className="flex flex-col gap-3">
        <h2 id="out-heading" className="text-kiosk-lead font-bold">
          {out.length === 0 ? 'You have nothing out' : `You have ${out.length === 1 ? 'one tool' : `${out.length} tools`} out${overdue ? `, ${overdue} overdue` : ''}`}
        </h2>
        {out.length ? (
          <ul className="flex flex-col gap-2">
            {out.map((checkout) => (
              <li
                key={checkout.id}
                className={`flex flex-wrap items-center justify-between gap-x-6 gap-y-1 rounded-xl border-2 px-5 py-3 text-kiosk-body ${checkout.overdue ? 'border-link-down' : 'border-ink-muted'}`}
              >
                <span className="font-bold">{checkout.itemName}</span>
                <span className="flex items-center gap-3">
                  {checkout.overdue ? <Icon name="warning" className="size-8 text-link-down" /> : <Icon name="hourglass" className="size-8" />}
                  {checkout.dueAt ? outLine(checkout.dueAt, now, timeZone) : null}
                </span>
              </li>
            ))}
          </ul>
        ) : null}
      </section>

      <div className="grid gap-6 lg:grid-cols-2">
        <section aria-labelledby="scan-heading" className="flex flex-col items-center gap-4 rounded-2xl border-2 border-ink-muted p-5">
          <h2 id="scan-heading" className="sr-only">
            Add to the basket
          </h2>
          {picking ? (
            <ConsumablePicker
              quantityOf={(itemId) => quantityOf(lines, itemId)}
              onChange={(item, quantity) => setLines((current) => setConsumable(current, item, quantity))}
              onClose={() => setPicking(false)}
            />
          ) : (
            <>
              <TagReader prompt="Scan each tool’s tag" onTag={onTag} busy={lookup.isPending} Camera={Camera} />
              <Button variant="quiet" onClick={() => setPicking(true)}>
                Add a consumable
              </Button>
            </>
          )}
        </section>

        <section aria-labelledby="basket-heading" className="flex flex-col gap-4">
          <h2 id="basket-heading" className="text-kiosk-lead font-bold">
            Basket{lines.length ? ` (${lines.length})` : ''}
          </h2>
          {lines.length === 0 ? <p className="text-kiosk-body text-ink-muted">Scan a tool’s tag to add it, or add a consumable.</p> : null}
          <ul className="flex flex-col gap-3">
            {lines.map((line) => (
              <li key={line.itemId} className={`flex items-center gap-4 rounded-xl border-2 px-5 py-3 ${line.problem ? 'border-link-down' : 'border-ink-muted'}`}>
                <div className="min-w-0 flex-1">
                  <p className="text-kiosk-body font-bold">{line.kind === 'tool' ? line.name : `${line.quantity} ${line.unit} · ${line.name}`}</p>
                  {line.kind === 'tool' ? <p className="text-kiosk-body">{dueBackLine(line.dueAt, now, timeZone)}</p> : null}
                  {line.problem ? (
                    <p className="flex items-center gap-3 text-kiosk-body font-bold text-link-down">
                      <Icon name="warning" className="size-8 shrink-0" />
                      {line.problem}
                    </p>
                  ) : null}
                </div>
                <Button variant="quiet" aria-label={`Remove ${line.name}`} onClick={() => setLines((current) => removeLine(current, line.itemId))}>
                  <Icon name="cross" className="size-8" />
                  Remove
                </Button>
              </li>
            ))}
          </ul>
        </section>
      </div>

      <p role="status" aria-live="polite" className={`min-h-touch text-kiosk-body font-bold ${announcement?.problem ? 'text-link-down' : ''}`}>
        {announcement?.text ?? ''}
      </p>

      <CribCaution />

      <div className="flex flex-wrap gap-4">
        <Button onClick={confirm} disabled={!canConfirm(lines) || checkout.isPending}>
          <Icon name="check" className="size-10" />
          {checkout.isPending ? 'Checking out…' : 'Confirm checkout'}
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
      {lines.some((line) => line.problem) ? <p className="text-kiosk-body">Take the marked lines off the basket (or change their count) to confirm the rest.</p> : null}
    </div>
  );
}
