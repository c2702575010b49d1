import { Button } from './button';

interface PaginationProps {
  page: number;
  pageSize: number;
  total: number;
  /** What is paged, one and many: ["member", "members"]. */
  nouns: readonly [string, string];
  onPageChange: (page: number) => void;
}

function pageCount(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / pageSize));
}

export function Pagination({ page, pageSize, total, nouns, onPageChange }: PaginationProps) {
  const pages = pageCount(total, pageSize);
  const noun = total === 1 ? nouns[0] : nouns[1];
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label={`Pages of ${nouns[1]}`} className="flex flex-wrap items-center justify-between gap-3">
      <p className="text-neutral-700" aria-live="polite">
        {total === 0 ? `No ${noun}` : `${first}–${last} of ${total} ${noun}`}
        {pages > 1 && ` · page ${page} of ${pages}`}
      </p>
      <div className={pages > 1 ? 'flex gap-2' : 'hidden'}>
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
