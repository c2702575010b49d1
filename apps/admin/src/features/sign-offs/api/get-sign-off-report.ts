import { signOffListSchema, type SignOff } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, apiHref } from '../../../lib/api-client';
import { signOffKeys, type SignOffReportStatus } from './sign-off-keys';

export function getSignOffReport(status: SignOffReportStatus, signal?: AbortSignal): Promise<SignOff[]> {
  return api.get('/sign-offs/report', { query: { status }, schema: signOffListSchema, signal });
}

/** The same rows as the table, as a file the browser saves. */
export function signOffReportCsvHref(status: SignOffReportStatus): string {
  return apiHref('/sign-offs/report', { status, format: 'csv' });
}

export function signOffReportQueryOptions(status: SignOffReportStatus) {
  return queryOptions({
    queryKey: signOffKeys.report(status),
    queryFn: ({ signal }) => getSignOffReport(status, signal),
  });
}

export function useSignOffReport(status: SignOffReportStatus) {
  return useQuery(signOffReportQueryOptions(status));
}
