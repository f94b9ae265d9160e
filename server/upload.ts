// One uploaded file per request (multer, kept in memory up to a size limit), with multer's errors
// answered in the API's error shape: 413 over the limit, 400 naming the field otherwise. Put it
// after the route's access declaration, so an unauthorised upload is refused before it is read.
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import multer from 'multer';

import { HttpError } from '@/server/http-error';

/** Receives the file in the form field `file`; `tooLarge` says what to do instead when it is over `maxBytes`. */
export function receiveOneFile(maxBytes: number, tooLarge: string): RequestHandler {
  const handler = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 5 } }).single('file');
  return (req: Request, res: Response, next: NextFunction) => {
    handler(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'payload_too_large', `The file is larger than ${maxBytes / 1_000_000} MB; ${tooLarge}.`));
        return next(new HttpError(400, 'validation_failed', `file: ${err.message}; send one file in the field "file"`, [{ path: 'file', message: err.message }]));
      }
      return next(err);
    });
  };
}
