import type { ComponentProps } from 'react';
import { Link } from 'react-router-dom';
import { cn } from './cn';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-brand text-white hover:bg-brand-strong',
  secondary: 'border border-neutral-500 bg-white text-neutral-900 hover:bg-neutral-100',
  danger: 'bg-danger text-white hover:bg-danger-strong',
  quiet: 'text-brand underline-offset-4 hover:bg-brand-soft hover:underline',
};

/** 44 px tall on phones so that a thumb finds it; a little tighter where a mouse is likely. */
export function buttonClasses(variant: ButtonVariant = 'primary', className?: string): string {
  return cn(
    'inline-flex min-h-11 items-center justify-center gap-2 rounded-md px-4 py-2 text-base font-bold',
    'transition-colors disabled:cursor-not-allowed disabled:opacity-60 md:min-h-10',
    variants[variant],
    className,
  );
}

type ButtonProps = ComponentProps<'button'> & {
  variant?: ButtonVariant;
  /** Keeps the label (so the control keeps its name) and shows that the work is under way. */
  pending?: boolean;
};

export function Button({ variant = 'primary', pending = false, className, children, disabled, type, ...props }: ButtonProps) {
  return (
    <button
      type={type ?? 'button'}
      className={buttonClasses(variant, className)}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      {...props}
    >
      {pending && (
        <span
          aria-hidden="true"
          className="size-4 animate-spin rounded-full border-2 border-current border-r-transparent"
        />
      )}
      {children}
    </button>
  );
}

type ButtonLinkProps = ComponentProps<typeof Link> & { variant?: ButtonVariant };

export function ButtonLink({ variant = 'secondary', className, ...props }: ButtonLinkProps) {
  return <Link className={buttonClasses(variant, className)} {...props} />;
}
