import { machineCategoryLabels, type StationSelf } from '@chuckkey/core';
import type { ReactNode } from 'react';
import { Nameplate } from '@/components/ui/nameplate';

/**
 * The machine's nameplate: tagged out with its reason while a tag-out is open, in use while a
 * session runs, else available; the plate never claims what the station cannot know. `children`
 * sit under the plate, such as the idle screen's mini time bar.
 */
export function StationHeader({
  station,
  compact = false,
  inUse = false,
  taggedOut = null,
  children,
}: {
  station: StationSelf;
  compact?: boolean;
  inUse?: boolean;
  taggedOut?: { reason: string } | null;
  children?: ReactNode;
}) {
  if (!station.machine) {
    return (
      <header className="bg-brand px-8 py-4 text-white">
        <p className="text-kiosk-body font-bold tracking-[0.12em] uppercase">{station.name}</p>
      </header>
    );
  }
  return (
    <header className="flex flex-col gap-3 px-6 pt-5">
      {taggedOut ? (
        <Nameplate name={station.machine.name} state="tagged_out" detail={taggedOut.reason} detailLines={2} size={compact ? 'md' : 'lg'} />
      ) : (
        <Nameplate
          name={station.machine.name}
          state={inUse ? 'in_use' : 'available'}
          detail={machineCategoryLabels[station.machine.category as keyof typeof machineCategoryLabels] ?? station.machine.category}
          size={compact ? 'md' : 'lg'}
        />
      )}
      {children}
    </header>
  );
}
