/** The choice that asks for the member's own words instead of a common reason. */
export const OTHER = 'Other…';

/** What is sent: a common reason with the member's words after it, or their words alone for "Other…". */
export function reportReason(choice: string, detail: string): string {
  const words = detail.trim();
  if (choice === OTHER) return words;
  return words ? `${choice}: ${words}` : choice;
}
