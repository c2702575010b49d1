import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Button } from './button';
import { EmptyState } from './empty-state';
import { Pagination } from './pagination';
import { QueryError } from './query-error';
import { Spinner } from './spinner';

interface ResultPage {
  items: readonly unknown[];
  total: number;
}

interface PagedResultsProps<TPage extends ResultPage> {
  /** A list query that keeps the previous page on screen while the next one loads. */
  query: UseQueryResult<TPage>;
  loadingLabel: string;
  /** What could not be loaded, in the words of the page: "the audit log". */
  what: string;
  page: number;
  pageSize: number;
  /** What is paged, one and many: ["entry", "entries"]. */
  nouns: readonly [string, string];
  onPageChange: (page: number) => void;
  /** Shown when the first page is empty: nothing recorded, or nothing matches the filters. */
  empty: ReactNode;
  /** Why a later page can come back empty, under its heading. */
  pastEndNote?: ReactNode;
  children: (items: TPage['items']) => ReactNode;
}

/**
 * A paged list with every state it can be in: loading, failed, empty, and a page past the end
 * (an old link, or the list has shrunk since) that offers the way back to the first page.
 * The page being replaced stays dimmed, and marked busy, until the next one arrives.
 */
export function PagedResults<TPage extends ResultPage>({
  query,
  loadingLabel,
  what,
  page,
  pageSize,
  nouns,
  onPageChange,
  empty,
  pastEndNote,
  children,
}: PagedResultsProps<TPage>) {
  return (
    <>
      {query.isPending ? (
        <Spinner label={loadingLabel} />
      ) : query.isError ? (
        <QueryError error={query.error} what={what} onRetry={() => void query.refetch()} retrying={query.isFetching} />
      ) : query.data.items.length === 0 ? (
        page > 1 ? (
          <EmptyState
            title="This page is empty"
            action={
              <Button variant="secondary" onClick={() => onPageChange(1)}>
                Go to the first page
              </Button>
            }
          >
            {pastEndNote}
          </EmptyState>
        ) : (
          empty
        )
      ) : (
        <div className={query.isPlaceholderData ? 'opacity-60 transition-opacity' : undefined} aria-busy={query.isPlaceholderData}>
          {children(query.data.items)}
        </div>
      )}

      {query.data && query.data.total > 0 && (
        <Pagination page={page} pageSize={pageSize} total={query.data.total} nouns={nouns} onPageChange={onPageChange} />
      )}
    </>
  );
}
