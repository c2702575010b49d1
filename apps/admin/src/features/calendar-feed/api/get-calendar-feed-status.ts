import { calendarFeedStatusSchema, type CalendarFeedStatus } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const calendarFeedKeys = {
  all: ['calendar-feed'] as const,
  status: () => [...calendarFeedKeys.all, 'status'] as const,
};

/** Whether the member has a feed and since when; the address itself is shown only when it is made. */
export function getCalendarFeedStatus(): Promise<CalendarFeedStatus> {
  return api.get('/profile/calendar-feed', { schema: calendarFeedStatusSchema });
}

export const calendarFeedStatusQuery = () => queryOptions({ queryKey: calendarFeedKeys.status(), queryFn: getCalendarFeedStatus });

export function useCalendarFeedStatus() {
  return useQuery(calendarFeedStatusQuery());
}
