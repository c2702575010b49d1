import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'quiet' | 'link';

const variants: Record<Variant, string> = {
  primary: 'min-h-20 rounded-lg bg-brand px-10 text-kiosk-lead font-bold text-white hover:bg-brand-deep disabled:opacity-50',
  quiet: 'min-h-16 rounded-lg border-2 border-ink-muted px-8 text-kiosk-body font-bold text-ink hover:bg-surface-raised disabled:opacity-50',
  // Small on the page, still a 48 px target for a gloved finger.
  link: 'min-h-touch px-4 text-kiosk-body font-bold text-ink underline underline-offset-8 decoration-2',
};

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
}

export function Button({ variant = 'primary', className, type = 'button', ...props }: ButtonProps) {
  return (
    <button
      type={type}
      className={`inline-flex items-center justify-center gap-4 focus-visible:outline-4 focus-visible:outline-offset-4 focus-visible:outline-ink disabled:cursor-not-allowed ${variants[variant]} ${className ?? ''}`}
      {...props}
    />
  );
}
