import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError } from '../lib/httpError';

/** One dieline file in the field `file`, kept in memory up to the size limit. */
export function uploadDieline(maxBytes: number): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1, fields: 5, fieldSize: 10_000, parts: 8 },
  }).single('file');
  const mb = Math.round(maxBytes / 1024 / 1024);
  return (req, res, next) => {
    upload(req, res, (error: unknown) => {
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE') {
          return next(
            new HttpError(
              413,
              'file_too_large',
              `The file is larger than ${mb} MB. Simplify the drawing or split it, and try again.`,
            ),
          );
        }
        return next(
          new HttpError(
            400,
            'bad_upload',
            `The upload was not understood (${error.message}). Send one file in the field "file".`,
          ),
        );
      }
      if (error)
        return next(
          new HttpError(400, 'bad_upload', 'The upload was cut short or is not a valid form upload. Try again.'),
        );
      if (!req.file)
        return next(
          new HttpError(400, 'validation_failed', 'Choose a dieline file to upload.', { file: 'Choose a file' }),
        );
      next();
    });
  };
}
