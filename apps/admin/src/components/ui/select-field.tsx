import type { ComponentProps, ReactNode } from 'react';
import { cn } from './cn';
import { FieldShell, controlClasses, describedBy, useFieldIds } from './field';

type SelectFieldProps = ComponentProps<'select'> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  containerClassName?: string;
};

export function SelectField({ label, hint, error, id, className, containerClassName, children, ...props }: SelectFieldProps) {
  const ids = useFieldIds(id);
  return (
    <FieldShell ids={ids} label={label} hint={hint} error={error} className={containerClassName}>
      <select id={ids.control} className={cn(controlClasses, 'pr-8', className)} {...describedBy(ids, hint, error)} {...props}>
        {children}
      </select>
    </FieldShell>
  );
}
