import type { Request, RequestHandler } from 'express';
import { fileTypeFromBuffer } from 'file-type';
import multer from 'multer';
import { AppError, badRequest } from './errors';

/**
 * Uploads are read into memory and stored in PostgreSQL (bytea): every server process behind
 * the load balancer then sees the same files without a shared disk. The limits keep one
 * request from holding more than one file of at most `maxBytes` in memory.
 */
export interface UploadRule {
  /** The multipart field that carries the file. */
  field: string;
  maxBytes: number;
  /** How the messages name the file: "photo", "waiver scan". */
  label: string;
}

function megabytes(bytes: number): string {
  return `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB`;
}

export function tooLarge({ field, maxBytes, label }: UploadRule): AppError {
  const message = `The ${label} is larger than ${megabytes(maxBytes)}. Choose a smaller file.`;
  return new AppError(413, 'too_large', message, { errors: { [field]: [message] } });
}

function uploadError(error: unknown, rule: UploadRule): AppError {
  if (error instanceof multer.MulterError) {
    switch (error.code) {
      case 'LIMIT_FILE_SIZE':
        return tooLarge(rule);
      case 'LIMIT_UNEXPECTED_FILE':
      case 'LIMIT_FILE_COUNT':
        return badRequest('unexpected_file', `Send one file, in the form field "${rule.field}".`, {
          [rule.field]: [`Send one file, in the form field "${rule.field}".`],
        });
      default:
        return badRequest('malformed_upload', `The upload was not understood (${error.message}).`);
    }
  }
  // busboy's own errors: a cut-off body, a missing boundary.
  return badRequest('malformed_upload', 'The upload was cut off or is not valid multipart/form-data. Try again.');
}

/** Reads one file from a multipart/form-data request, within the rule's limits. */
export function singleUpload(rule: UploadRule): RequestHandler {
  const handler = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: rule.maxBytes, files: 1, fields: 10, fieldSize: 10_000, parts: 11 },
  }).single(rule.field);
  return (req, res, next) => {
    handler(req, res, (error?: unknown) => next(error ? uploadError(error, rule) : undefined));
  };
}

/** The uploaded file's bytes, or 400 file_missing. */
export function uploadedFile(req: Request, rule: UploadRule): Buffer {
  const file = req.file;
  if (!file || file.fieldname !== rule.field) {
    const message = `Choose a ${rule.label} to upload (multipart/form-data field "${rule.field}").`;
    throw badRequest('file_missing', message, { [rule.field]: [message] });
  }
  return file.buffer;
}

/**
 * The file's type read from its content (its magic numbers), never from its name or the
 * browser's claim: a text file renamed photo.jpg is refused with 415 unsupported_type.
 */
export async function sniffType<T extends string>(data: Buffer, allowed: readonly T[], rule: UploadRule, kinds: string): Promise<T> {
  const found = data.length > 0 ? await fileTypeFromBuffer(data) : undefined;
  if (found && (allowed as readonly string[]).includes(found.mime)) return found.mime as T;
  throw unsupportedType(rule, kinds);
}

export function unsupportedType(rule: UploadRule, kinds: string): AppError {
  const message = `The ${rule.label} must be ${kinds}; this file is not.`;
  return new AppError(415, 'unsupported_type', message, { errors: { [rule.field]: [message] } });
}
