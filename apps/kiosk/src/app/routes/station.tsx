import { CribStationScreens } from '@/features/crib-station/components/crib-station-screens';
import { useShop } from '@/features/shop/api/get-shop';
import { useStation } from '@/features/station/api/get-station';
import { BadgeCamera } from '@/features/station/components/badge-camera';
import { BadgeReader } from '@/features/station/components/badge-reader';
import { PairScreen } from '@/features/station/components/pair-screen';
import { SafetyLine } from '@/features/station/components/safety-line';
import { StationScreens } from '@/features/station/components/station-screens';
import { useHeartbeat } from '@/features/station/hooks/use-heartbeat';
import { useStationLost } from '@/features/station/hooks/use-station-lost';
import { isApiError } from '@/lib/api-client';

const cribScanners = { BadgeReader, Camera: BadgeCamera };

/** A station paired to the crib reports in and reads badges as a machine's station does. */
function CribStation({ timeZone }: { timeZone: string }) {
  useHeartbeat();
  useStationLost();
  return <CribStationScreens timeZone={timeZone} scanners={cribScanners} />;
}

export function Component() {
  const shop = useShop();
  const station = useStation();
  const unpaired = isApiError(station.error, 401);
  // Kiosk queries retry without end, so they never reach an error state; a failed try is the cue.
  const unreachable = (!shop.data && shop.failureCount > 0) || (!station.data && !unpaired && station.failureCount > 0);

  return (
    <div className="flex min-h-full flex-col">
      <title>Station · Chuckkey</title>
      {station.data && shop.data && !unpaired ? (
        station.data.kind === 'crib' ? (
          <CribStation timeZone={shop.data.timeZone} />
        ) : (
          <StationScreens station={station.data} timeZone={shop.data.timeZone} />
        )
      ) : (
        <>
          <header className="bg-brand px-8 py-4 text-white">
            <p className="text-kiosk-body font-bold tracking-[0.12em] uppercase">Station</p>
          </header>
          <main className="flex flex-1 flex-col items-center justify-center gap-8 px-8 py-12">
            {shop.data && unpaired ? (
              <PairScreen shopName={shop.data.name} />
            ) : unreachable ? (
              <p role="alert" className="text-kiosk-lead text-balance text-center">
                The shop’s server does not answer yet. This screen keeps trying.
              </p>
            ) : (
              <p className="text-kiosk-lead text-ink-muted">Loading…</p>
            )}
          </main>
        </>
      )}
      <footer className="flex justify-center px-8 pb-5">
        <SafetyLine />
      </footer>
    </div>
  );
}
