import { Icon } from '@/components/ui/icon';

/** The crib's plate across the top, in place of a machine's nameplate: the band names the place. */
export function CribHeader({ compact = false }: { compact?: boolean }) {
  const rivet = <span aria-hidden="true" className="size-3 shrink-0 rounded-full bg-current opacity-60" />;
  return (
    <header className="flex flex-col px-6 pt-5">
      <div className="flex flex-col overflow-hidden rounded-xl border-4 border-brand bg-brand text-white">
        <div className="flex items-center gap-4 bg-black/30 px-5 py-2">
          {rivet}
          {/* CSS capitals keep the words spelled normally for screen readers. */}
          <p className="min-w-0 flex-1 text-center text-plate-name-lg font-bold tracking-[0.12em] uppercase">Tool crib</p>
          {rivet}
        </div>
        {compact ? null : (
          <p className="flex items-center gap-4 px-6 py-3 text-kiosk-lead font-bold">
            <Icon name="wrench" className="size-12" />
            <span>Check tools out and bring them back</span>
          </p>
        )}
      </div>
    </header>
  );
}
