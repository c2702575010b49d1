export function StationAwaitingPairing({ shopName }: { shopName: string }) {
  return (
    <div className="flex max-w-[40ch] flex-col items-center gap-8 text-center">
      <h1 className="text-kiosk-title font-bold text-balance">{shopName}</h1>
      <p className="text-kiosk-lead text-balance">This screen becomes a machine’s station once an admin pairs it.</p>
    </div>
  );
}
