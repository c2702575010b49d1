import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { auditFiltersToSearchParams, readAuditFilters, type AuditFilters } from '../utils/audit-filters';

export function useAuditFilters() {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = useMemo(() => readAuditFilters(searchParams), [searchParams]);
  const update = useCallback(
    (change: Partial<AuditFilters>) => {
      // Choosing another action starts again at its first page.
      setSearchParams((current) => auditFiltersToSearchParams({ ...readAuditFilters(current), ...change, page: change.page ?? 1 }));
    },
    [setSearchParams],
  );
  return [filters, update] as const;
}
