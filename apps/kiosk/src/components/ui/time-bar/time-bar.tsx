import { shopDate } from '@chuckkey/core';
import type { ReactNode } from 'react';
import { Icon, type IconName } from '../icon';
import { railPercent, railSpan, spanWords, wallMinutes, type TimeBarKind } from './time-bar-layout';

export interface TimeBarItem {
  startsAt: string;
  endsAt: string;
  kind: TimeBarKind;
  /** A first name at most, said after the times in the legend. */
  who?: string;
}

const looks: Record<TimeBarKind, { bar: string; icon: IconName }> = {
  member: { bar: 'bg-state-reserved', icon: 'hourglass' },
  class: { bar: 'bg-state-reserved', icon: 'person' },
  session: { bar: 'bg-state-in-use', icon: 'chuck' },
};

const HOUR_TICKS = [6, 9, 12, 15, 18, 21, 24];

/**
 * screens.md "Time bars": today on the machine as bars on a 06:00–24:00 rail in the shop's time
 * zone. The drawing is for the eye; every bar is also listed in words (the kind, its icon and its
 * times), so colour never carries meaning alone and screen readers hear "Reserved 14:00–16:00".
 * `mini` sits under the station's nameplate; `full` adds the hours along the rail and shows the
 * words beneath it.
 */
export function TimeBar({
  items,
  now,
  timeZone,
  label,
  size,
  caption,
}: {
  items: readonly TimeBarItem[];
  now: Date;
  timeZone: string;
  /** The rail's name for screen readers, such as "Today on this machine". */
  label: string;
  size: 'mini' | 'full';
  /** A line above the rail, such as the next reservation in words. */
  caption?: ReactNode;
}) {
  const day = shopDate(now, timeZone);
  const nowAt = railPercent(wallMinutes(now, day, timeZone));
  const placed = items.flatMap((item) => {
    const start = new Date(item.startsAt);
    const end = new Date(item.endsAt);
    const span = railSpan(start, end, day, timeZone);
    return span ? [{ item, span, words: `${spanWords(item.kind, start, end, timeZone)}${item.who ? `, ${item.who}` : ''}` }] : [];
  });

  return (
    <figure aria-label={label} className="flex w-full flex-col gap-2">
      {caption ? <figcaption className="flex items-center gap-3 text-kiosk-body font-bold">{caption}</figcaption> : null}
      <div aria-hidden="true" className={`relative w-full overflow-hidden rounded-md border-2 border-ink-muted bg-surface-raised ${size === 'mini' ? 'h-10' : 'h-16'}`}>
        {/* The part of the day already gone, dimmed. */}
        <div className="absolute inset-y-0 left-0 bg-white/10" style={{ width: `${nowAt}%` }} />
        {placed.map(({ item, span }) => (
          <div
            key={`${item.kind}-${item.startsAt}`}
            data-testid="time-bar-span"
            className={`absolute inset-y-1 flex items-center justify-center overflow-hidden text-white ${looks[item.kind].bar} ${span.clippedStart ? '' : 'rounded-l-md'} ${span.clippedEnd ? '' : 'rounded-r-md'}`}
            style={{ left: `${span.left}%`, width: `${span.width}%` }}
          >
            <Icon name={looks[item.kind].icon} className={size === 'mini' ? 'size-7' : 'size-10'} />
          </div>
        ))}
        <div className="absolute inset-y-0 w-1 -translate-x-1/2 bg-ink" style={{ left: `${nowAt}%` }} />
      </div>
      {size === 'full' ? (
        <div aria-hidden="true" className="relative h-9 w-full text-kiosk-body text-ink-muted">
          {HOUR_TICKS.map((hour) => (
            <span
              key={hour}
              className={`absolute top-0 tabular-nums ${hour === 6 ? '' : hour === 24 ? '-translate-x-full' : '-translate-x-1/2'}`}
              style={{ left: `${railPercent(hour * 60)}%` }}
            >
              {String(hour).padStart(2, '0')}:00
            </span>
          ))}
        </div>
      ) : null}
      <ul className={size === 'full' ? 'flex flex-wrap gap-x-8 gap-y-2 text-kiosk-body' : 'sr-only'}>
        {placed.length === 0 ? <li>Nothing reserved today</li> : null}
        {placed.map(({ item, words }) => (
          <li key={`${item.kind}-${item.startsAt}`} className="flex items-center gap-3">
            <Icon name={looks[item.kind].icon} className="size-9" />
            {words}
          </li>
        ))}
      </ul>
    </figure>
  );
}
