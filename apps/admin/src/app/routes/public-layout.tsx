import { Outlet } from 'react-router-dom';
import { useShop } from '../../features/shop/api/get-shop';

function Rivet() {
  return <span aria-hidden="true" className="size-2 rounded-full bg-white/50 ring-1 ring-black/30" />;
}

/** Signed-out pages sit on one plate, the same shape the machines wear on the shop floor. */
export default function PublicLayout() {
  const shop = useShop();
  return (
    <div className="flex min-h-dvh flex-col items-center px-4 py-8 sm:justify-center sm:py-12">
      <div className="w-full max-w-md overflow-hidden rounded-lg border-2 border-brand bg-white shadow-sm">
        <div className="flex items-center gap-3 bg-brand px-4 py-2">
          <Rivet />
          <p className="flex-1 text-center font-bold tracking-[0.3em] text-white uppercase">Chuckkey</p>
          <Rivet />
        </div>
        <main id="main" className="flex flex-col gap-6 p-5 sm:p-8">
          <Outlet />
        </main>
      </div>
      {shop.data && (
        <p className="mt-4 text-center text-neutral-700">
          {shop.data.name} · {shop.data.town}
        </p>
      )}
    </div>
  );
}
