import { cn } from './cn';

export function Spinner({ label = 'Loading…', className }: { label?: string; className?: string }) {
  return (
    <div role="status" className={cn('flex items-center gap-3 py-6 text-neutral-700', className)}>
      <span
        aria-hidden="true"
        className="size-5 animate-spin rounded-full border-[3px] border-brand border-r-transparent"
      />
      <span>{label}</span>
    </div>
  );
}
