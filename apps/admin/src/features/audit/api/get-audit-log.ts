import { auditPageSchema, type AuditPage } from '@chuckkey/core';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { AUDIT_PAGE_SIZE, type AuditFilters } from '../utils/audit-filters';
import { auditKeys } from './audit-keys';

export function getAuditLog(filters: AuditFilters, signal?: AbortSignal): Promise<AuditPage> {
  return api.get('/audit', { query: { ...filters, pageSize: AUDIT_PAGE_SIZE }, schema: auditPageSchema, signal });
}

export function auditLogQueryOptions(filters: AuditFilters) {
  return queryOptions({
    queryKey: auditKeys.list(filters),
    queryFn: ({ signal }) => getAuditLog(filters, signal),
    placeholderData: keepPreviousData,
  });
}

export function useAuditLog(filters: AuditFilters) {
  return useQuery(auditLogQueryOptions(filters));
}
