import type { ComponentProps, ReactNode } from 'react';
import { cn } from './cn';
import { describedBy, FieldError, useFieldIds } from './field';

type CheckboxFieldProps = Omit<ComponentProps<'input'>, 'type' | 'size'> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  /** Checklists ticked on a shop floor tablet get a box a gloved thumb can hit. */
  size?: 'normal' | 'large';
  containerClassName?: string;
};

/** The whole row, label included, is the target, so it is at least 44 px tall. */
export function CheckboxField({ label, hint, error, size = 'normal', id, className, containerClassName, ...props }: CheckboxFieldProps) {
  const ids = useFieldIds(id);
  const large = size === 'large';
  return (
    <div className={containerClassName ?? 'flex flex-col gap-1'}>
      <label
        htmlFor={ids.control}
        className={cn(
          'flex min-h-11 cursor-pointer items-start gap-3 rounded-md',
          large && 'border border-neutral-300 bg-white px-3 py-2.5 has-checked:border-brand has-checked:bg-brand-soft',
          className,
        )}
      >
        <input
          id={ids.control}
          type="checkbox"
          className={cn('shrink-0 cursor-pointer accent-brand', large ? 'mt-0.5 size-7' : 'mt-1 size-5')}
          {...describedBy(ids, hint, error)}
          {...props}
        />
        <span className="flex flex-col gap-0.5 pt-0.5">
          <span className={cn('text-neutral-900', large ? 'text-lg' : 'font-bold')}>{label}</span>
          {hint && (
            <span id={ids.hint} className="text-sm text-neutral-700">
              {hint}
            </span>
          )}
        </span>
      </label>
      {error && <FieldError id={ids.error}>{error}</FieldError>}
    </div>
  );
}
