import { useId, type ComponentProps, type ReactNode } from 'react';
import { cn } from './cn';
import { FieldError } from './field';

interface ChoiceGroupProps {
  legend: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  children: ReactNode;
  className?: string;
}

/** A set of checkboxes or radio buttons under one question, its hint and error read with it. */
export function ChoiceGroup({ legend, hint, error, children, className }: ChoiceGroupProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const described = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(' ');
  return (
    <fieldset aria-describedby={described || undefined} className={cn('flex min-w-0 flex-col gap-2', className)}>
      <legend className="mb-1.5 font-bold text-neutral-900">{legend}</legend>
      {hint && (
        <p id={hintId} className="-mt-1 text-sm text-neutral-700">
          {hint}
        </p>
      )}
      {children}
      {error && <FieldError id={errorId}>{error}</FieldError>}
    </fieldset>
  );
}

interface RadioOptionProps extends Omit<ComponentProps<'input'>, 'type'> {
  label: ReactNode;
  description?: ReactNode;
}

/** A radio button with a sentence saying what choosing it means. */
export function RadioOption({ label, description, id, className, ...props }: RadioOptionProps) {
  const auto = useId();
  const controlId = id ?? auto;
  const descriptionId = `${controlId}-description`;
  return (
    <label
      htmlFor={controlId}
      className={cn(
        'flex min-h-11 cursor-pointer items-start gap-3 rounded-md border border-neutral-300 bg-white px-3 py-2.5',
        'has-checked:border-brand has-checked:bg-brand-soft',
        className,
      )}
    >
      <input
        id={controlId}
        type="radio"
        aria-describedby={description ? descriptionId : undefined}
        className="mt-0.5 size-6 shrink-0 cursor-pointer accent-brand"
        {...props}
      />
      <span className="flex flex-col gap-0.5">
        <span className="font-bold text-neutral-900">{label}</span>
        {description && (
          <span id={descriptionId} className="text-neutral-700">
            {description}
          </span>
        )}
      </span>
    </label>
  );
}
