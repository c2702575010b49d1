export function BoardAwaitingPairing() {
  return (
    <div className="flex h-full items-center justify-center px-[6vw] text-center">
      <p className="max-w-[36ch] text-board-message font-bold">The machines appear here once an admin pairs this board.</p>
    </div>
  );
}
