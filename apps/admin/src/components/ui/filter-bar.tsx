import type { ReactNode } from 'react';
import { buttonClasses } from './button';
import { cn } from './cn';
import { DownloadIcon } from './icons';
import { SelectField } from './select-field';

/**
 * The filters above a list, as a search landmark named `label`, with the list's "Export CSV" link
 * (the same filters, every match) at the end when `exportHref` is given.
 */
export function FilterBar({ label, exportHref, className, children }: { label: string; exportHref?: string | undefined; className?: string; children: ReactNode }) {
  return (
    <div role="search" aria-label={label} className={cn('flex flex-col gap-3 sm:flex-row sm:flex-wrap sm:items-end', className)}>
      {children}
      {exportHref && (
        <a href={exportHref} download className={cn(buttonClasses('secondary'), 'sm:ml-auto')}>
          <DownloadIcon />
          Export CSV
        </a>
      )}
    </div>
  );
}

/**
 * One filter chosen from a fixed list, or none ("Every …"). `onChange` hears the chosen value, or
 * undefined for none or for a value `isChoice` does not know.
 */
export function ChoiceFilter<T extends string>({
  label,
  every,
  value,
  choices,
  isChoice,
  onChange,
  className,
}: {
  label: string;
  every: string;
  value: T | undefined;
  choices: readonly { value: T; label: string }[];
  isChoice: (value: string) => value is T;
  onChange: (value: T | undefined) => void;
  className?: string;
}) {
  return (
    <SelectField
      label={label}
      value={value ?? ''}
      onChange={(event) => onChange(isChoice(event.target.value) ? event.target.value : undefined)}
      containerClassName={cn('flex flex-col gap-1.5', className)}
    >
      <option value="">{every}</option>
      {choices.map((choice) => (
        <option key={choice.value} value={choice.value}>
          {choice.label}
        </option>
      ))}
    </SelectField>
  );
}
