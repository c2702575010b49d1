import { describe, expect, it } from 'vitest';
import { linkParts } from './link-parts';

describe('linkParts', () => {
  it('makes the link in an invitation mail followable', () => {
    const text = 'Hello Ada,\nOpen http://127.0.0.1:3000/accept-invitation?token=abc_DEF-123 to join.';

    expect(linkParts(text)).toEqual([
      { kind: 'text', text: 'Hello Ada,\nOpen ' },
      { kind: 'link', href: 'http://127.0.0.1:3000/accept-invitation?token=abc_DEF-123' },
      { kind: 'text', text: ' to join.' },
    ]);
  });

  it('leaves the full stop that ends the sentence out of the link', () => {
    expect(linkParts('See https://shop.example/reset-password?token=x.')).toEqual([
      { kind: 'text', text: 'See ' },
      { kind: 'link', href: 'https://shop.example/reset-password?token=x' },
      { kind: 'text', text: '.' },
    ]);
  });

  it('keeps text without links as it is', () => {
    expect(linkParts('No links here.')).toEqual([{ kind: 'text', text: 'No links here.' }]);
  });

  it('does not turn other schemes into links', () => {
    expect(linkParts('javascript:alert(1)')).toEqual([{ kind: 'text', text: 'javascript:alert(1)' }]);
  });
});
