import { useState, type KeyboardEvent } from 'react';
import { cn } from '../../../components/ui/cn';
import { calendarDateLabel, type Slot, type SlotState, type WeekDay } from '../utils/week-slots';

interface WeekViewProps {
  days: readonly WeekDay[];
  /** The start of the slot chosen, if any, as epoch milliseconds. */
  chosen: number | null;
  onChoose: (slot: Slot) => void;
}

const slotStyles: Record<SlotState, string> = {
  free: 'border-neutral-500 bg-white text-neutral-900 hover:bg-brand-soft',
  taken: 'border-neutral-300 bg-neutral-200 text-neutral-700',
  class: 'border-neutral-300 bg-neutral-200 text-neutral-700',
  past: 'border-neutral-200 bg-neutral-50 text-neutral-500',
};

const stateWords: Record<SlotState, string> = { free: 'Free', taken: 'Taken', class: 'Class', past: 'Past' };

const stepKeys: Record<string, (index: number, last: number) => number> = {
  ArrowRight: (i, last) => Math.min(i + 1, last),
  ArrowDown: (i, last) => Math.min(i + 1, last),
  ArrowLeft: (i) => Math.max(i - 1, 0),
  ArrowUp: (i) => Math.max(i - 1, 0),
  Home: () => 0,
  End: (_, last) => last,
};

/**
 * One machine's week: days as rows on a phone and as columns on a wide screen. Every slot is a
 * button so that a screen reader hears its day, time and state; slots that cannot be chosen stay
 * reachable (aria-disabled) so that "taken" is heard, not skipped. A day of 15-minute slots has
 * dozens of them, so each day is one stop for Tab and the arrow keys move within it.
 */
export function WeekView({ days, chosen, onChoose }: WeekViewProps) {
  const [focusedByDay, setFocusedByDay] = useState<Record<string, number>>({});

  /** The slot of a day that Tab lands on: the last one moved to, else the chosen one, else the first free one. */
  const tabStop = (day: WeekDay): number => {
    const moved = focusedByDay[day.date];
    if (moved !== undefined && moved < day.slots.length) return moved;
    const picked = day.slots.findIndex((slot) => slot.start.getTime() === chosen);
    if (picked >= 0) return picked;
    return Math.max(0, day.slots.findIndex((slot) => slot.state === 'free'));
  };

  const onKeyDown = (day: WeekDay, index: number) => (event: KeyboardEvent<HTMLButtonElement>) => {
    const step = stepKeys[event.key];
    if (!step) return;
    event.preventDefault();
    const next = step(index, day.slots.length - 1);
    setFocusedByDay((current) => ({ ...current, [day.date]: next }));
    const list = event.currentTarget.closest('ul');
    list?.querySelectorAll('button')[next]?.focus();
  };

  return (
    <div className="flex flex-col gap-4 md:grid md:grid-cols-7 md:gap-2">
      {days.map((day) => {
        const headingId = `day-${day.date}`;
        return (
          <div key={day.date} role="group" aria-labelledby={headingId} className="flex flex-col gap-2">
            <h3 id={headingId} className="font-bold text-neutral-900">
              {day.name} <span className="font-normal text-neutral-700">{calendarDateLabel(day.date, 'short')}</span>
            </h3>
            {day.slots.length === 0 ? (
              <p className="text-neutral-700">{day.closure ? `Closed: ${day.closure}` : 'Closed'}</p>
            ) : (
              <ul className="flex flex-wrap gap-1 md:flex-col">
                {day.slots.map((slot, index) => {
                  const selectable = slot.state === 'free';
                  const isChosen = chosen === slot.start.getTime();
                  return (
                    <li key={slot.start.getTime()}>
                      <button
                        type="button"
                        aria-label={slot.label}
                        aria-pressed={selectable ? isChosen : undefined}
                        aria-disabled={selectable ? undefined : true}
                        tabIndex={index === tabStop(day) ? 0 : -1}
                        onKeyDown={onKeyDown(day, index)}
                        onFocus={() => setFocusedByDay((current) => (current[day.date] === index ? current : { ...current, [day.date]: index }))}
                        onClick={() => selectable && onChoose(slot)}
                        className={cn(
                          'flex min-h-11 w-20 flex-col items-center justify-center rounded-md border text-sm md:min-h-10 md:w-full',
                          slotStyles[slot.state],
                          selectable ? 'cursor-pointer' : 'cursor-not-allowed',
                          isChosen && 'border-brand bg-brand text-white hover:bg-brand-strong',
                        )}
                      >
                        <span className="font-bold">{slot.time}</span>
                        <span className="max-w-full truncate px-1 text-xs">{isChosen ? 'Chosen' : (slot.classTitle ?? stateWords[slot.state])}</span>
                      </button>
                    </li>
                  );
                })}
              </ul>
            )}
          </div>
        );
      })}
    </div>
  );
}
