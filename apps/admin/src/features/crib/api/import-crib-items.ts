import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, apiHref } from '../../../lib/api-client';
import { cribItemKeys } from './crib-item-keys';

const importResultSchema = z.object({ created: z.number().int(), updated: z.number().int() });
export type CribImportResult = z.infer<typeof importResultSchema>;

/** The inventory as RFC 4180 CSV, saved by the browser itself. */
export const cribItemsCsvHref = apiHref('/crib/items/export.csv');

export function importCribItems(csv: string): Promise<CribImportResult> {
  return api.post('/crib/items/import', { body: { csv }, schema: importResultSchema });
}

export function useImportCribItems() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importCribItems,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cribItemKeys.all }),
  });
}
