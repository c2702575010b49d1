import { PHOTO_MAX_BYTES } from '@chuckkey/core';
import { z } from 'zod';
import { api, ApiError, type UploadOptions } from './api-client';

export interface UploadRules {
  maxBytes: number;
  /** Declared types the browser reports; the server checks the content itself. */
  types: readonly string[];
  missing: string;
  wrongType: string;
  tooLarge: string;
}

function isFile(value: unknown): value is File {
  return typeof File !== 'undefined' && value instanceof File;
}

/**
 * Catches the obvious mistakes (no file, a PDF where a photo goes, a 20 MB camera original)
 * before anything is sent; a renamed file still reaches the server, which refuses it by content.
 */
export function uploadFileSchema(rules: UploadRules) {
  return z.unknown().transform((value, ctx): File => {
    if (!isFile(value) || value.size === 0) {
      ctx.addIssue({ code: 'custom', message: rules.missing });
      return z.NEVER;
    }
    if (!rules.types.includes(value.type)) {
      ctx.addIssue({ code: 'custom', message: rules.wrongType });
      return z.NEVER;
    }
    if (value.size > rules.maxBytes) {
      ctx.addIssue({ code: 'custom', message: rules.tooLarge });
      return z.NEVER;
    }
    return value;
  });
}

export function formatMegabytes(bytes: number): string {
  return `${new Intl.NumberFormat(undefined, { maximumFractionDigits: 1 }).format(bytes / (1024 * 1024))} MB`;
}

/** The server's limits for a photo, a member's or a crib item's alike. */
export const photoRules: UploadRules = {
  maxBytes: PHOTO_MAX_BYTES,
  types: ['image/jpeg', 'image/png'],
  missing: 'Choose a photo first.',
  wrongType: 'Choose a JPEG or PNG picture. Phones can save or share a photo as JPEG.',
  tooLarge: `That photo is larger than ${formatMegabytes(PHOTO_MAX_BYTES)}. Choose a smaller one, or save it at a lower resolution.`,
};

/** Sends one file as a multipart form, in the field the server reads it from. */
export function sendFile<S extends z.ZodType | undefined = undefined>(path: string, field: string, file: File, options: Omit<UploadOptions<S>, 'body'> = {}) {
  const body = new FormData();
  body.append(field, file);
  return api.upload<S>(path, { ...options, body });
}

/** Reads a picture into a data: address for a preview; the page's content policy allows those for images. */
export function readAsDataUrl(file: File): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result));
    reader.onerror = () => reject(reader.error ?? new Error('The file could not be read.'));
    reader.readAsDataURL(file);
  });
}

/**
 * The sentence for a refused upload, by HTTP status: a proxy in front of the server may answer
 * 413 without problem details, and the page's own words name the limit and the kinds it takes.
 */
export function refusedUploadMessage(error: unknown, rules: Pick<UploadRules, 'wrongType' | 'tooLarge'>): string | null {
  if (!(error instanceof ApiError)) return null;
  if (error.status === 413) return rules.tooLarge;
  if (error.status === 415) return `${rules.wrongType} Chuckkey looks at what is inside the file, not at its name.`;
  return null;
}
