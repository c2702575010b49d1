import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import sharp from 'sharp';
import { INCIDENT_PHOTO_MAX_BYTES, INCIDENT_PHOTO_MAX_COUNT, INCIDENT_PHOTO_TYPES } from '@chuckkey/core';
import { badRequest, type AppError } from '../../lib/errors';
import { sniffType, tooLarge, unsupportedType, type UploadRule } from '../../lib/uploads';

export const INCIDENT_PHOTOS_UPLOAD: UploadRule = { field: 'photos', maxBytes: INCIDENT_PHOTO_MAX_BYTES, label: 'photo' };
const KINDS = 'a JPEG or PNG image';
// A camera's full-size picture is well under this; a small file claiming a vast bitmap is refused.
const MAX_INPUT_PIXELS = 100_000_000;

const tooMany = () => {
  const message = `Attach at most ${INCIDENT_PHOTO_MAX_COUNT} photos.`;
  return badRequest('too_many_photos', message, { photos: [message] });
};

function uploadError(error: unknown): AppError {
  if (error instanceof multer.MulterError) {
    switch (error.code) {
      case 'LIMIT_FILE_SIZE':
        return tooLarge(INCIDENT_PHOTOS_UPLOAD);
      case 'LIMIT_FILE_COUNT':
        return tooMany();
      case 'LIMIT_UNEXPECTED_FILE':
        if (error.field === INCIDENT_PHOTOS_UPLOAD.field) return tooMany();
        return badRequest('unexpected_file', 'Send the photos in the form field "photos".', { photos: ['Send the photos in the form field "photos".'] });
      default:
        return badRequest('malformed_upload', `The upload was not understood (${error.message}).`);
    }
  }
  return badRequest('malformed_upload', 'The upload was cut off or is not valid multipart/form-data. Try again.');
}

/**
 * Reads the report's fields and up to five photos into memory. Every limit is checked while the
 * request is read, before the route runs, so a refused upload leaves nothing behind.
 */
export function incidentPhotosUpload(): RequestHandler {
  const handler = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: INCIDENT_PHOTO_MAX_BYTES, files: INCIDENT_PHOTO_MAX_COUNT, fields: 20, fieldSize: 40_000, parts: 30 },
  }).array(INCIDENT_PHOTOS_UPLOAD.field, INCIDENT_PHOTO_MAX_COUNT);
  return (req, res, next) => {
    handler(req, res, (error?: unknown) => next(error ? uploadError(error) : undefined));
  };
}

export interface CheckedPhoto {
  image: Buffer;
  contentType: (typeof INCIDENT_PHOTO_TYPES)[number];
}

/**
 * Each photo's type read from its content, never from its name or the browser's claim, and then
 * decoded in full: a file that starts like a PNG but does not decode is refused too (415).
 */
export async function checkedPhotos(req: Request): Promise<CheckedPhoto[]> {
  const files = Array.isArray(req.files) ? req.files : [];
  const checked: CheckedPhoto[] = [];
  for (const [index, file] of files.entries()) {
    const rule = { ...INCIDENT_PHOTOS_UPLOAD, label: `photo ${index + 1} (${file.originalname || 'no name'})` };
    const contentType = await sniffType(file.buffer, INCIDENT_PHOTO_TYPES, rule, KINDS);
    try {
      await sharp(file.buffer, { failOn: 'error', limitInputPixels: MAX_INPUT_PIXELS }).stats();
    } catch {
      throw unsupportedType(rule, `${KINDS} that can be read`);
    }
    checked.push({ image: file.buffer, contentType });
  }
  return checked;
}
