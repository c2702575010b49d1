import {
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from '@tanstack/react-table';
import { useState } from 'react';
import { SortableTh, TBody, THead, Table, Td, Tr } from '../../../components/ui/table';
import { cn } from '../../../components/ui/cn';

/** Numbers line up on the right, where their digits compare at a glance. */
export interface ReportColumnMeta {
  numeric?: boolean;
}

interface ReportTableProps<T> {
  caption: string;
  data: readonly T[];
  columns: ColumnDef<T>[];
  /** The order the rows arrive in from the report, shown until someone sorts on a column. */
  initialSorting?: SortingState;
  getRowId: (row: T) => string;
}

/** A report's table: every column sorts either way, and the table scrolls inside its own box on a phone. */
export function ReportTable<T>({ caption, data, columns, initialSorting = [], getRowId }: ReportTableProps<T>) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting);
  // No component memoizes the table's functions: they are read while rendering, never kept.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: data as T[],
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId,
  });

  return (
    <Table caption={caption} className="max-h-[28rem] overflow-y-auto">
      <THead>
        {table.getHeaderGroups().map((group) => (
          <Tr key={group.id}>
            {group.headers.map((header) => {
              const sorted = header.column.getIsSorted();
              const numeric = (header.column.columnDef.meta as ReportColumnMeta | undefined)?.numeric;
              return (
                <SortableTh
                  key={header.id}
                  label={String(header.column.columnDef.header)}
                  order={sorted === false ? undefined : sorted}
                  onSort={() => header.column.toggleSorting(sorted === false ? header.column.getFirstSortDir() === 'desc' : sorted === 'asc')}
                  className={cn('sticky top-0 bg-neutral-50', numeric && 'text-right')}
                />
              );
            })}
          </Tr>
        ))}
      </THead>
      <TBody>
        {table.getRowModel().rows.map((row) => (
          <Tr key={row.id}>
            {row.getVisibleCells().map((cell) => {
              const numeric = (cell.column.columnDef.meta as ReportColumnMeta | undefined)?.numeric;
              return (
                <Td key={cell.id} className={cn(numeric && 'text-right tabular-nums')}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </Td>
              );
            })}
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
