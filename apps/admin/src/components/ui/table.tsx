import type { ComponentProps, ReactNode } from 'react';
import type { SortColumn, SortOrder } from '../../lib/table-sort';
import { cn } from './cn';
import { SortIcon } from './icons';

interface TableProps {
  /** Names the table for screen readers and the scrolling region around it. */
  caption: string;
  children: ReactNode;
  className?: string;
}

/**
 * Wide tables scroll sideways on phones; the region can take focus so that keyboard users
 * can scroll it too.
 */
export function Table({ caption, children, className }: TableProps) {
  return (
    <div
      role="region"
      aria-label={caption}
      tabIndex={0}
      className={cn('overflow-x-auto rounded-lg border border-neutral-300 bg-white', className)}
    >
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">{caption}</caption>
        {children}
      </table>
    </div>
  );
}

export function THead(props: ComponentProps<'thead'>) {
  return <thead className="border-b border-neutral-300 bg-neutral-50" {...props} />;
}

export function TBody(props: ComponentProps<'tbody'>) {
  return <tbody className="divide-y divide-neutral-200" {...props} />;
}

export function Tr({ className, ...props }: ComponentProps<'tr'>) {
  return <tr className={cn('align-middle', className)} {...props} />;
}

export function Th({ className, ...props }: ComponentProps<'th'>) {
  return (
    <th
      scope="col"
      className={cn('whitespace-nowrap px-4 py-3 text-sm font-bold text-neutral-800', className)}
      {...props}
    />
  );
}

export function Td({ className, ...props }: ComponentProps<'td'>) {
  return <td className={cn('px-4 py-3 text-neutral-900', className)} {...props} />;
}

interface SortableThProps {
  label: string;
  /** The order when this column is the one sorted on; undefined when another column is. */
  order: SortOrder | undefined;
  onSort: () => void;
  className?: string;
}

export function SortableTh({ label, order, onSort, className }: SortableThProps) {
  const ariaSort = order === 'asc' ? 'ascending' : order === 'desc' ? 'descending' : 'none';
  return (
    <th scope="col" aria-sort={ariaSort} className={cn('whitespace-nowrap px-2 py-1.5 text-sm', className)}>
      <button
        type="button"
        onClick={onSort}
        className="inline-flex min-h-11 items-center gap-1 rounded-md px-2 font-bold text-neutral-800 hover:bg-neutral-200 md:min-h-9"
      >
        {label}
        <SortIcon direction={order ?? 'none'} className="size-4 shrink-0" />
      </button>
    </th>
  );
}

interface SortableThsProps<F extends string> {
  columns: readonly SortColumn<F>[];
  /** The column the rows are sorted on now, and which way. */
  sortedField: F;
  order: SortOrder;
  onSort: (field: F) => void;
}

/** The headings of every sortable column, the sorted one marked for screen readers by aria-sort. */
export function SortableThs<F extends string>({ columns, sortedField, order, onSort }: SortableThsProps<F>) {
  return columns.map((column) => (
    <SortableTh key={column.field} label={column.label} order={sortedField === column.field ? order : undefined} onSort={() => onSort(column.field)} />
  ));
}

/**
 * The heading over a row's buttons, read out but not shown. Positioned, so the hidden heading
 * stays inside the table's scrolling region on a phone.
 */
export function ActionsTh() {
  return (
    <Th className="relative">
      <span className="sr-only">Actions</span>
    </Th>
  );
}
