import multer, { MulterError } from 'multer';
import type { RequestHandler } from 'express';
import { HttpError } from './http-error.ts';

const MALFORMED =
  'The upload could not be read: the form data is malformed or was cut off. Choose the file and send it again.';

/**
 * One file in the multipart field `file`, held in memory and refused past maxBytes (multer's LIMIT_FILE_SIZE,
 * which the error handler answers with 413). Text fields of the same form land in req.body. A body the multipart
 * parser cannot read (no boundary, cut off part-way) is the client's mistake, answered 400 with a sentence.
 */
export function singleUpload(maxBytes: number): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1, fields: 20 },
  }).single('file');
  return (req, res, next) => {
    parse(req, res, (error?: unknown) => {
      if (error === undefined || error === null || error instanceof MulterError) return next(error);
      next(new HttpError('invalid', MALFORMED));
    });
  };
}
