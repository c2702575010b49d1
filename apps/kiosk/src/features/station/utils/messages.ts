import { isApiError } from '@/lib/api-client';

// The station's own words for the answers a person at the machine can do something about;
// anything else shows the server's sentence.
const byCode: Record<string, string> = {
  wrong_pin: 'That PIN is not right. Try again.',
  unknown_badge: 'This badge is not known here. Try it again, or ask an admin for a new card.',
  member_inactive: 'This member’s account is not active. An admin can help at the desk.',
  network_error: 'The shop’s server does not answer. Try again in a moment.',
};

export function stationMessage(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  return byCode[error.code] ?? error.message;
}
