import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

const linkClass =
  'inline-flex min-h-touch items-center rounded-lg bg-brand px-8 text-kiosk-body font-bold text-white focus-visible:outline-4 focus-visible:outline-offset-4 focus-visible:outline-ink';

export function Component() {
  return (
    <main className="flex min-h-full flex-col items-center justify-center gap-10 px-8 py-12 text-center">
      <title>Not found · Chuckkey</title>
      <h1 className="text-kiosk-title font-bold">There is no screen at this address</h1>
      <nav aria-label="Screens" className="flex flex-wrap justify-center gap-6">
        <Link to={paths.station.getHref()} className={linkClass}>
          Station
        </Link>
        <Link to={paths.board.getHref()} className={linkClass}>
          Board
        </Link>
      </nav>
    </main>
  );
}
