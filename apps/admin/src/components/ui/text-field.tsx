import type { ComponentProps, ReactNode } from 'react';
import { cn } from './cn';
import { FieldShell, controlClasses, describedBy, useFieldIds } from './field';

type TextFieldProps = ComponentProps<'input'> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  containerClassName?: string;
};

export function TextField({ label, hint, error, id, className, containerClassName, ...props }: TextFieldProps) {
  const ids = useFieldIds(id);
  return (
    <FieldShell ids={ids} label={label} hint={hint} error={error} className={containerClassName}>
      <input id={ids.control} className={cn(controlClasses, className)} {...describedBy(ids, hint, error)} {...props} />
    </FieldShell>
  );
}

/**
 * A whole number typed in: phones show their number pad, and no autofill list covers it. A
 * text box rather than type="number", so an empty box stays empty and a mouse wheel over it
 * changes nothing; the form's schema reads the number.
 */
export function CountField(props: Omit<TextFieldProps, 'inputMode' | 'type'>) {
  return <TextField inputMode="numeric" autoComplete="off" {...props} />;
}
