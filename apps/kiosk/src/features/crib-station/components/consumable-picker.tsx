import type { CribStationConsumable } from '@chuckkey/core';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { useCribConsumables } from '../api/get-crib-consumables';

const stepper =
  'inline-flex size-20 items-center justify-center rounded-lg border-4 border-ink-muted text-kiosk-title font-bold leading-none hover:bg-surface-raised focus-visible:outline-4 focus-visible:outline-offset-4 focus-visible:outline-ink disabled:cursor-not-allowed disabled:opacity-40';

/** Consumables carry no tag: they are picked from a list and counted with − and +. */
export function ConsumablePicker({
  quantityOf,
  onChange,
  onClose,
}: {
  quantityOf: (itemId: string) => number;
  onChange: (item: CribStationConsumable, quantity: number) => void;
  onClose: () => void;
}) {
  const consumables = useCribConsumables();

  return (
    <section aria-labelledby="consumables-heading" className="flex w-full flex-col gap-4">
      <h2 id="consumables-heading" className="text-kiosk-lead font-bold">
        Add a consumable
      </h2>
      {consumables.isPending ? <p className="text-kiosk-body">Loading the shelf…</p> : null}
      {consumables.data && consumables.data.length === 0 ? <p className="text-kiosk-body">No consumables are in stock right now.</p> : null}
      <ul className="flex max-h-[28rem] flex-col gap-3 overflow-y-auto">
        {(consumables.data ?? []).map((item) => {
          const count = quantityOf(item.id);
          return (
            <li key={item.id} className="flex flex-wrap items-center justify-between gap-4 rounded-xl border-2 border-ink-muted px-5 py-3">
              <div className="min-w-0 flex-1">
                <p className="text-kiosk-body font-bold">{item.name}</p>
                <p className="text-kiosk-body text-ink-muted">
                  {item.stock} {item.unit} in stock{item.binLocation ? ` · bin ${item.binLocation}` : ''}
                </p>
              </div>
              <div className="flex items-center gap-4">
                <button type="button" className={stepper} aria-label={`One fewer: ${item.name}`} disabled={count === 0} onClick={() => onChange(item, count - 1)}>
                  −
                </button>
                <output aria-live="polite" aria-label={`${item.name}: ${count} ${item.unit}`} className="min-w-16 text-center text-kiosk-title font-bold tabular-nums">
                  {count}
                </output>
                <button type="button" className={stepper} aria-label={`One more: ${item.name}`} disabled={count >= item.stock} onClick={() => onChange(item, count + 1)}>
                  +
                </button>
              </div>
            </li>
          );
        })}
      </ul>
      <Button variant="quiet" onClick={onClose}>
        <Icon name="check" className="size-8" />
        Done adding
      </Button>
    </section>
  );
}
