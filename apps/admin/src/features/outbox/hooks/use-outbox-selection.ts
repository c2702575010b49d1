import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';

function readPage(value: string | null): number {
  const page = Number(value);
  return Number.isInteger(page) && page >= 1 ? page : 1;
}

/** The page and the open message live in the URL, so that a message can be linked and reloaded. */
export function useOutboxSelection() {
  const [searchParams, setSearchParams] = useSearchParams();
  const page = readPage(searchParams.get('page'));
  const messageId = searchParams.get('message');

  const hrefFor = useCallback(
    (id: string) => {
      const params = new URLSearchParams();
      if (page > 1) params.set('page', String(page));
      params.set('message', id);
      return `?${params.toString()}`;
    },
    [page],
  );

  const goToPage = useCallback(
    (next: number) => {
      setSearchParams(next > 1 ? { page: String(next) } : {});
    },
    [setSearchParams],
  );

  return useMemo(() => ({ page, messageId, hrefFor, goToPage }), [page, messageId, hrefFor, goToPage]);
}
