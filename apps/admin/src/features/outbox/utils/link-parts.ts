export type TextPart = { kind: 'text'; text: string } | { kind: 'link'; href: string };

// Stops before whitespace and before the closing punctuation that ends a sentence around a link.
const urlPattern = /https?:\/\/[^\s<>"']+[^\s<>"'.,;:!?)\]]/g;

/**
 * Splits a mail's plain-text body into text and web links, so that the links an e-mail carries
 * (reset a password, accept an invitation) can be followed straight from the outbox.
 */
export function linkParts(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(urlPattern)) {
    const start = match.index;
    if (start > last) parts.push({ kind: 'text', text: text.slice(last, start) });
    parts.push({ kind: 'link', href: match[0] });
    last = start + match[0].length;
  }
  if (last < text.length) parts.push({ kind: 'text', text: text.slice(last) });
  return parts;
}
