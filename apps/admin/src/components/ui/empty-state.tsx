import type { ReactNode } from 'react';
import { cn } from './cn';

interface EmptyStateProps {
  title: ReactNode;
  /** What the person can do next; an empty screen should never be a dead end. */
  children?: ReactNode;
  action?: ReactNode;
  className?: string;
}

export function EmptyState({ title, children, action, className }: EmptyStateProps) {
  return (
    <div className={cn('flex flex-col items-start gap-2 rounded-lg border border-dashed border-neutral-400 bg-white px-5 py-6', className)}>
      <p className="text-lg font-bold text-neutral-900">{title}</p>
      {children && <div className="text-neutral-700">{children}</div>}
      {action && <div className="mt-2">{action}</div>}
    </div>
  );
}
