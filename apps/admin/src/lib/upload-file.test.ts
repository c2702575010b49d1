import { PHOTO_MAX_BYTES } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';
import { formatMegabytes, refusedUploadMessage, uploadFileSchema } from './upload-file';

const photo = uploadFileSchema({
  maxBytes: PHOTO_MAX_BYTES,
  types: ['image/jpeg', 'image/png'],
  missing: 'Choose a photo.',
  wrongType: 'Choose a JPEG or PNG photo.',
  tooLarge: 'Choose a photo of at most 5 MB.',
});

function file(bytes: number, type: string, name = 'me.jpg'): File {
  return new File([new Uint8Array(bytes)], name, { type });
}

function message(value: unknown): string | undefined {
  const result = photo.safeParse(value);
  return result.success ? undefined : result.error.issues[0]?.message;
}

describe('checking a photo before it is sent', () => {
  it('lets a JPEG or a PNG through', () => {
    expect(photo.safeParse(file(1000, 'image/jpeg')).success).toBe(true);
    expect(photo.safeParse(file(1000, 'image/png', 'me.png')).success).toBe(true);
  });

  it('asks for a file when none was chosen, or the file is empty', () => {
    expect(message(undefined)).toBe('Choose a photo.');
    expect(message(file(0, 'image/jpeg'))).toBe('Choose a photo.');
  });

  it('refuses other kinds of file', () => {
    expect(message(file(1000, 'application/pdf', 'me.pdf'))).toBe('Choose a JPEG or PNG photo.');
    expect(message(file(1000, 'image/heic', 'me.heic'))).toBe('Choose a JPEG or PNG photo.');
  });

  it('accepts exactly 5 MB and refuses one byte more', () => {
    expect(photo.safeParse(file(PHOTO_MAX_BYTES, 'image/jpeg')).success).toBe(true);
    expect(message(file(PHOTO_MAX_BYTES + 1, 'image/jpeg'))).toBe('Choose a photo of at most 5 MB.');
  });
});

describe('formatMegabytes', () => {
  it('shows sizes the way the limits are written', () => {
    expect(formatMegabytes(5 * 1024 * 1024)).toMatch(/^5 MB$/);
    expect(formatMegabytes(1.25 * 1024 * 1024)).toMatch(/^1[.,]3 MB$/);
  });
});

describe('a refused upload', () => {
  const rules = { wrongType: 'Choose a JPEG or PNG photo.', tooLarge: 'Choose a photo of at most 5 MB.' };

  it('says what is wrong whether the server or a proxy in front of it refused it', () => {
    expect(refusedUploadMessage(new ApiError({ status: 413, code: 'too_large', title: 'x' }), rules)).toBe(rules.tooLarge);
    expect(refusedUploadMessage(new ApiError({ status: 413, code: 'http_413', title: 'x' }), rules)).toBe(rules.tooLarge);
    expect(refusedUploadMessage(new ApiError({ status: 415, code: 'unsupported_type', title: 'x' }), rules)).toMatch(
      /^Choose a JPEG or PNG photo\. .*inside the file/,
    );
  });

  it('leaves other failures to the usual handling', () => {
    expect(refusedUploadMessage(new ApiError({ status: 400, code: 'file_missing', title: 'x' }), rules)).toBeNull();
    expect(refusedUploadMessage(new Error('boom'), rules)).toBeNull();
  });
});
