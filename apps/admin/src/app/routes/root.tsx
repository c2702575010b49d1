import { Outlet, ScrollRestoration } from 'react-router-dom';
import { Button } from '../../components/ui/button';
import { Spinner } from '../../components/ui/spinner';

export function RootLayout() {
  return (
    <>
      <Outlet />
      <ScrollRestoration />
    </>
  );
}

export function RouteLoading() {
  return (
    <div className="mx-auto flex min-h-dvh max-w-md items-center justify-center px-4">
      <Spinner />
    </div>
  );
}

/** Last resort for what no page caught, most often a page's code that failed to download after a release. */
export function RootError() {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-4 px-4">
      <title>Something went wrong · Chuckkey</title>
      <h1 className="text-2xl font-bold text-neutral-900">Something went wrong</h1>
      <p className="text-neutral-800">
        This page could not be shown. Reloading usually fixes it; if not, try again in a few minutes.
      </p>
      <div>
        <Button onClick={() => window.location.reload()}>Reload the page</Button>
      </div>
    </main>
  );
}
