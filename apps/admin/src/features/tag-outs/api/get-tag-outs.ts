import { tagOutListSchema, type TagOutList } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { tagOutKeys } from './tag-out-keys';

/** The open tag-outs (longest out of service first), or the cleared ones (latest first). */
export function getTagOuts(open: boolean, signal?: AbortSignal): Promise<TagOutList> {
  return api.get(`/tag-outs?open=${open}`, { schema: tagOutListSchema, signal });
}

export function tagOutsQueryOptions(open: boolean) {
  return queryOptions({ queryKey: tagOutKeys.list(open), queryFn: ({ signal }) => getTagOuts(open, signal) });
}

export function useTagOuts(open: boolean) {
  return useQuery(tagOutsQueryOptions(open));
}
