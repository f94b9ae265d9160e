// One uploaded file per request (multer, kept in memory up to a size limit), with multer's errors
// answered in the API's error shape: 413 over the limit, 400 naming the field otherwise (a body
// the multipart reader cannot read, too). Put it after the route's access declaration, so an
// unauthorised upload is refused before it is read.
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import multer from 'multer';

import { HttpError } from '@/server/http-error';
import { assertStorableBody } from '@/server/middleware/body-guard';

/** Receives the file in the form field `file`; `tooLarge` says what to do instead when it is over `maxBytes`. */
export function receiveOneFile(maxBytes: number, tooLarge: string): RequestHandler {
  const handler = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 5 } }).single('file');
  return (req: Request, res: Response, next: NextFunction) => {
    handler(req, res, (err: unknown) => {
      if (!err) {
        // The upload's text fields (mode, title) face the same rules as a JSON body.
        try {
          assertStorableBody(req.body);
        } catch (e) {
          return next(e);
        }
        return next();
      }
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'payload_too_large', `The file is larger than ${maxBytes / 1_000_000} MB; ${tooLarge}.`));
        return next(new HttpError(400, 'validation_failed', `file: ${err.message}; send one file in the field "file"`, [{ path: 'file', message: err.message }]));
      }
      // Anything else comes from reading the multipart body itself (busboy: no boundary, a
      // malformed part header, a body cut short): the upload is broken, not the server.
      const reason = err instanceof Error ? err.message : 'the upload cannot be read';
      const message = `the upload cannot be read (${reason})`;
      return next(new HttpError(400, 'validation_failed', `file: ${message}; send one file as multipart/form-data in the field "file"`, [{ path: 'file', message }]));
    });
  };
}
