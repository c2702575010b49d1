import { usageReportSchema, type UsageGrouping, type UsageReport } from '@chuckkey/core';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { DateRange } from '../utils/date-range';

export const usageKeys = {
  all: ['usage-report'] as const,
  report: (range: DateRange, groupBy: UsageGrouping) => [...usageKeys.all, range.from, range.to, groupBy] as const,
};

export function getUsageReport(range: DateRange, groupBy: UsageGrouping, signal?: AbortSignal): Promise<UsageReport> {
  return api.get('/reports/usage', { query: { from: range.from, to: range.to, groupBy }, schema: usageReportSchema, signal });
}

export function usageReportQueryOptions(range: DateRange, groupBy: UsageGrouping) {
  return queryOptions({
    queryKey: usageKeys.report(range, groupBy),
    queryFn: ({ signal }) => getUsageReport(range, groupBy, signal),
    // The last range's figures stay on screen while the next range loads, so the page does not jump.
    placeholderData: keepPreviousData,
  });
}

export function useUsageReport(range: DateRange, groupBy: UsageGrouping) {
  return useQuery(usageReportQueryOptions(range, groupBy));
}
