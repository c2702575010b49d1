import { calendarFeedCreatedSchema } from '@chuckkey/core';
import { api } from '../../../lib/api-client';

/** A new private feed address; any earlier one stops working. */
export async function createCalendarFeed(): Promise<string> {
  const { url } = await api.post('/profile/calendar-feed', { schema: calendarFeedCreatedSchema });
  return url;
}

export async function revokeCalendarFeed(): Promise<void> {
  await api.delete('/profile/calendar-feed');
}
