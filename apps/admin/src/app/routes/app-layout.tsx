import { useState } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { Alert } from '../../components/ui/alert';
import { QueryError } from '../../components/ui/query-error';
import { paths } from '../../config/paths';
import { errorMessage } from '../../lib/api-client';
import { useMe } from '../../features/auth/api/get-me';
import { useSignOut } from '../../features/auth/api/sign-out';
import { useShop } from '../../features/shop/api/get-shop';
import { AppHeader } from '../components/app-header';
import type { SignedInContext } from '../signed-in-user';
import { RouteLoading } from './root';

/** The guard of every signed-in page; whoever is signed out goes to sign in and comes back after. */
export default function AppLayout() {
  const me = useMe();
  const shop = useShop();
  const signOut = useSignOut();
  const location = useLocation();
  const [signedOutOnPurpose, setSignedOutOnPurpose] = useState(false);

  if (me.data) {
    const context: SignedInContext = { user: me.data };
    return (
      <div className="flex min-h-dvh flex-col">
        <a
          href="#main"
          className="sr-only rounded-md bg-brand px-4 py-2 font-bold text-white focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-10"
        >
          Skip to content
        </a>
        <AppHeader
          user={me.data}
          shopName={shop.data?.name}
          signingOut={signOut.isPending}
          onSignOut={() => {
            setSignedOutOnPurpose(true);
            signOut.mutate(undefined, { onError: () => setSignedOutOnPurpose(false) });
          }}
        />
        <main id="main" tabIndex={-1} className="mx-auto flex w-full max-w-6xl flex-1 flex-col gap-6 px-4 py-6 md:py-8">
          {signOut.isError && (
            <Alert tone="error" title="Couldn't sign you out.">
              {errorMessage(signOut.error)}
            </Alert>
          )}
          <Outlet context={context} />
        </main>
      </div>
    );
  }

  if (me.isPending) return <RouteLoading />;

  if (me.isError) {
    return (
      <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-4 px-4">
        <title>Chuckkey</title>
        <h1 className="text-2xl font-bold text-neutral-900">Chuckkey</h1>
        <QueryError error={me.error} what="your account" onRetry={() => void me.refetch()} retrying={me.isFetching} />
      </main>
    );
  }

  const here = `${location.pathname}${location.search}${location.hash}`;
  const next = signedOutOnPurpose || here === paths.home.path ? undefined : here;
  return <Navigate to={paths.signIn.getHref(next)} replace />;
}
