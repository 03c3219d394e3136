import multer from 'multer';
import type { RequestHandler } from 'express';

/**
 * One file in the multipart field `file`, held in memory and refused past maxBytes (multer's LIMIT_FILE_SIZE,
 * which the error handler answers with 413). Text fields of the same form land in req.body.
 */
export function singleUpload(maxBytes: number): RequestHandler {
  return multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 20 } }).single(
    'file',
  );
}
