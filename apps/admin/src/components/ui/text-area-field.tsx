import type { ComponentProps, ReactNode } from 'react';
import { cn } from './cn';
import { FieldShell, controlClasses, describedBy, useFieldIds } from './field';

type TextAreaFieldProps = ComponentProps<'textarea'> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  containerClassName?: string;
};

export function TextAreaField({ label, hint, error, id, className, containerClassName, rows = 4, ...props }: TextAreaFieldProps) {
  const ids = useFieldIds(id);
  return (
    <FieldShell ids={ids} label={label} hint={hint} error={error} className={containerClassName}>
      <textarea
        id={ids.control}
        rows={rows}
        className={cn(controlClasses, 'leading-relaxed', className)}
        {...describedBy(ids, hint, error)}
        {...props}
      />
    </FieldShell>
  );
}
