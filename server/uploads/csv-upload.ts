/** One CSV file in the multipart field `file`, held in memory up to CSV_LIMIT_BYTES (larger is 413), with up to `fields` text fields. */
import type { RequestHandler } from 'express';
import multer from 'multer';
import type { Config } from '../config';
import { Problem } from '../errors';

export function csvUpload(config: Pick<Config, 'limits'>, fields = 0): RequestHandler {
  const multipart = multer({ storage: multer.memoryStorage(), limits: { fileSize: config.limits.csvBytes, files: 1, fields } }).single('file');
  // Multer reports a broken multipart body or an unexpected part as a bare error; it is the client's, so 400 naming the field.
  return (req, res, next) =>
    multipart(req, res, (error?: unknown) => {
      if (!error || (error as { code?: string }).code === 'LIMIT_FILE_SIZE') return next(error);
      next(Problem.badRequest(`The upload is not a single CSV file in the multipart field "file": ${(error as Error).message}`, [{ field: 'file', detail: 'must be one file in the multipart field "file"' }]));
    });
}
