import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { inventoryFiltersToSearchParams, readInventoryFilters, type InventoryFilters } from '../utils/inventory';

export function useInventoryFilters() {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = useMemo(() => readInventoryFilters(searchParams), [searchParams]);

  const update = useCallback(
    (change: Partial<InventoryFilters>) => {
      setSearchParams(
        (current) => {
          // A new search, filter or sort makes the old page number meaningless.
          const page = change.page ?? 1;
          return inventoryFiltersToSearchParams({ ...readInventoryFilters(current), ...change, page });
        },
        // Each key typed in the search replaces the entry, so the back button does not replay the typing.
        { replace: 'search' in change },
      );
    },
    [setSearchParams],
  );

  return [filters, update] as const;
}
