import type { ReactNode, Ref } from 'react';
import { cn } from './cn';
import { CheckIcon, ErrorIcon, InfoIcon, WarningIcon } from './icons';

type Tone = 'error' | 'success' | 'info' | 'warning';

const tones: Record<Tone, { box: string; icon: ReactNode }> = {
  error: { box: 'border-danger bg-danger-soft text-neutral-900', icon: <ErrorIcon className="size-5 shrink-0 text-danger" /> },
  success: { box: 'border-success bg-success-soft text-neutral-900', icon: <CheckIcon className="size-5 shrink-0 text-success" /> },
  info: { box: 'border-brand bg-brand-soft text-neutral-900', icon: <InfoIcon className="size-5 shrink-0 text-brand" /> },
  warning: { box: 'border-warning bg-warning-soft text-neutral-900', icon: <WarningIcon className="size-5 shrink-0 text-warning" /> },
};

interface AlertProps {
  tone?: Tone;
  title?: ReactNode;
  children?: ReactNode;
  action?: ReactNode;
  className?: string;
  id?: string;
  /** Lets a page move focus to a message it has just shown, such as a success after a form. */
  tabIndex?: number;
  ref?: Ref<HTMLDivElement>;
}

/** Errors interrupt (role alert); confirmations and notes wait their turn (role status). */
export function Alert({ tone = 'info', title, children, action, className, id, tabIndex, ref }: AlertProps) {
  const { box, icon } = tones[tone];
  return (
    <div
      ref={ref}
      id={id}
      tabIndex={tabIndex}
      role={tone === 'error' ? 'alert' : 'status'}
      className={cn('flex gap-3 rounded-md border-l-4 px-4 py-3', box, className)}
    >
      <div className="pt-0.5">{icon}</div>
      <div className="flex min-w-0 flex-1 flex-col gap-1">
        {title && <p className="font-bold">{title}</p>}
        {children && <div className="text-neutral-800">{children}</div>}
        {action && <div className="mt-1">{action}</div>}
      </div>
    </div>
  );
}
