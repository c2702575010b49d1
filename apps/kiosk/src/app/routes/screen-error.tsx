import { useEffect } from 'react';

// Kiosks hang on walls and beside machines with nobody at a keyboard, so a broken screen
// reloads itself rather than waiting for someone to notice.
const RELOAD_AFTER_MS = 60_000;

export function ScreenError() {
  useEffect(() => {
    const timer = setTimeout(() => window.location.reload(), RELOAD_AFTER_MS);
    return () => clearTimeout(timer);
  }, []);

  return (
    <main className="flex min-h-full flex-col items-center justify-center gap-6 px-8 text-center">
      <h1 className="text-kiosk-title font-bold">This screen ran into a problem</h1>
      <p className="text-kiosk-lead">It starts again by itself within a minute.</p>
    </main>
  );
}
