export const paths = {
  home: { path: '/', getHref: () => '/' },
  station: { path: '/station', getHref: () => '/station' },
  board: { path: '/board', getHref: () => '/board' },
} as const;

/** The router works below Vite's base, so `/station` is served at `/kiosk/station`. */
export const routerBasename = import.meta.env.BASE_URL.replace(/\/$/, '');
