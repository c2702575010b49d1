import { Navigate, createBrowserRouter } from 'react-router-dom';
import { paths, routerBasename } from '@/config/paths';
import { ScreenError } from './routes/screen-error';

export function createRouter() {
  return createBrowserRouter(
    [
      {
        path: paths.home.path,
        ErrorBoundary: ScreenError,
        HydrateFallback: () => null,
        children: [
          { index: true, element: <Navigate to={paths.station.getHref()} replace /> },
          { path: paths.station.path, lazy: () => import('./routes/station') },
          { path: paths.board.path, lazy: () => import('./routes/board') },
          { path: '*', lazy: () => import('./routes/not-found') },
        ],
      },
    ],
    { basename: routerBasename },
  );
}
