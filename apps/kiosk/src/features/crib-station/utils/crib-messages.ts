import { isApiError } from '@/lib/api-client';

export const NOT_CHECKED_OUT = 'This tool is not checked out, so there is nothing to return. Put it back in its bin.';

// The crib station's own words for the answers a member at the crib can act on; anything else
// shows the server's sentence.
const byCode: Record<string, string> = {
  unknown_badge: 'This badge is not known here. Try it again, or ask an admin for a new card.',
  member_inactive: 'This member’s account is not active. An admin can help at the desk.',
  crib_item_not_found: 'No tool in the crib has this tag. Scan the label again, or type the tag.',
  already_out: 'Someone else has just checked this tool out. Take it off the basket.',
  short_stock: 'Not enough of this is left in stock. Take fewer.',
  out_of_circulation: 'Out of circulation until an admin checks it. Hand it in at the desk.',
  not_checked_out: NOT_CHECKED_OUT,
  already_returned: 'This tool has just been returned.',
  too_many_requests: 'Too many scans in a minute. Wait a moment, then scan again.',
  network_error: 'The shop’s server does not answer. Try again in a moment.',
};

export function cribMessage(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  return byCode[error.code] ?? error.message;
}

/** The basket line a refused checkout names, if it names one. */
export function refusedLine(error: unknown): string | null {
  if (!isApiError(error)) return null;
  const itemId = error.extension('itemId');
  return typeof itemId === 'string' ? itemId : null;
}
