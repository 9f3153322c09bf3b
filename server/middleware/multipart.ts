/**
 * One multipart reader for every upload route: one file part named `file`, a few small text
 * fields, UTF-8 file names (busboy reads them as latin1 unless told), and every error answered in
 * the API's shape: 413 for size, 400 naming `file` for anything malformed (no boundary, a
 * truncated part, too many parts). A malformed body is the client's fault: it is logged once at
 * warn, without a stack.
 */
import { inspect } from 'node:util';
import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError, badRequest } from '../lib/http-error';

export interface UploadLimits {
  maxBytes: number;
  /** Text fields allowed beside the file (e.g. projectId). */
  fields?: number;
}

function mib(bytes: number): string {
  return (bytes / 1024 / 1024).toFixed(bytes % (1024 * 1024) === 0 ? 0 : 2);
}

function hasControlCharacter(name: string): boolean {
  return [...name].some((ch) => ch.charCodeAt(0) < 0x20 || ch.charCodeAt(0) === 0x7f);
}

export function singleFileUpload({ maxBytes, fields = 4 }: UploadLimits): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    defParamCharset: 'utf8',
    limits: { fileSize: maxBytes, files: 1, fields, fieldSize: 1024, fieldNameSize: 100, parts: fields + 1 },
  }).single('file');
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) {
        // A control character (NUL, CR, LF…) in a file name could break a header or a log line later.
        if (req.file && hasControlCharacter(req.file.originalname)) {
          console.warn(
            `multipart upload refused on ${req.method} ${req.path}: control character in the file name`,
          );
          return next(
            badRequest('The upload is not valid: the file name has a control character.', [
              { path: 'file', message: 'has a control character in its name' },
            ]),
          );
        }
        return next();
      }
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
        return next(
          new HttpError(413, 'too_large', `The file is larger than the limit of ${mib(maxBytes)} MiB.`, [
            { path: 'file', message: `must be at most ${maxBytes} bytes` },
          ]),
        );
      }
      const reason = err instanceof Error ? err.message : inspect(err);
      console.warn(`multipart upload refused on ${req.method} ${req.path}: ${reason}`);
      const message =
        err instanceof multer.MulterError && err.code === 'LIMIT_UNEXPECTED_FILE'
          ? 'send exactly one file, in the part named "file"'
          : err instanceof multer.MulterError
            ? reason.toLowerCase()
            : 'is not a readable multipart upload';
      next(badRequest(`The upload is not valid: ${message}.`, [{ path: 'file', message }]));
    });
  };
}
