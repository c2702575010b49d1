import { badgeSheetQuerySchema } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { badgeCardHref, badgeQrSrc, badgeSheetHref } from './badge-links';

const ada = '0b6f4a3e-8d2c-4b1a-9e7f-1c2d3e4f5a6b';
const bo = '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d';

describe('badge links', () => {
  it('points the card and the QR at the member’s own badge', () => {
    expect(badgeCardHref(ada)).toBe(`/api/members/${ada}/badge-card.pdf`);
    expect(badgeQrSrc(ada, 'b1')).toBe(`/api/members/${ada}/badge.svg?v=b1`);
  });

  it('asks for a sheet with the members the server reads back in the same order', () => {
    const href = badgeSheetHref([bo, ada]);
    const memberIds = new URL(href, 'http://chuckkey.invalid').searchParams.get('memberIds');

    expect(href.startsWith('/api/badges/sheet.pdf?memberIds=')).toBe(true);
    expect(badgeSheetQuerySchema.parse({ memberIds }).memberIds).toEqual([bo, ada]);
  });
});
