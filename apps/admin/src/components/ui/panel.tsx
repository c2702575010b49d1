import { useId, type ReactNode } from 'react';
import { cn } from './cn';

interface PanelProps {
  title: string;
  description?: ReactNode;
  children: ReactNode;
  className?: string;
}

export function Panel({ title, description, children, className }: PanelProps) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className={cn('rounded-lg border border-neutral-300 bg-white p-4 md:p-6', className)}>
      <div className="mb-4 flex flex-col gap-1">
        <h2 id={headingId} className="text-xl font-bold text-neutral-900">
          {title}
        </h2>
        {description && <div className="text-neutral-700">{description}</div>}
      </div>
      {children}
    </section>
  );
}
