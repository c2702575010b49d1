import { apiHref } from '../../../lib/api-client';

const member = (memberId: string) => `/members/${encodeURIComponent(memberId)}`;

/** The badge's QR; the badge id in the address makes the browser drop the old picture after a reissue. */
export function badgeQrSrc(memberId: string, badgeId: string): string {
  return apiHref(`${member(memberId)}/badge.svg`, { v: badgeId });
}

export function badgeCardHref(memberId: string): string {
  return apiHref(`${member(memberId)}/badge-card.pdf`);
}

/** One PDF with a card for each member chosen, in the order they were chosen. */
export function badgeSheetHref(memberIds: readonly string[]): string {
  return apiHref('/badges/sheet.pdf', { memberIds: memberIds.join(',') });
}
