import { Button } from './button';

interface PaginationProps {
  page: number;
  pageSize: number;
  total: number;
  /** The plural noun of what is paged: "people", "messages". */
  noun: string;
  onPageChange: (page: number) => void;
}

export function pageCount(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / pageSize));
}

export function Pagination({ page, pageSize, total, noun, onPageChange }: PaginationProps) {
  const pages = pageCount(total, pageSize);
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label={`Pages of ${noun}`} className="flex flex-wrap items-center justify-between gap-3">
      <p className="text-neutral-700" aria-live="polite">
        {total === 0 ? `No ${noun}` : `${first}–${last} of ${total} ${noun}`} · page {page} of {pages}
      </p>
      <div className="flex gap-2">
        <Button variant="secondary" onClick={() => onPageChange(page - 1)} disabled={page <= 1}>
          Previous page
        </Button>
        <Button variant="secondary" onClick={() => onPageChange(page + 1)} disabled={page >= pages}>
          Next page
        </Button>
      </div>
    </nav>
  );
}
