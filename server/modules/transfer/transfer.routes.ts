// GET /api/patterns/:id/export and POST /api/patterns/import (multipart field "file", or
// the pattern file itself as an application/json body).
import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import type { Config } from '../../config.ts';
import { param, route } from '../../http/allow.ts';
import { HttpError, badInput } from '../../http/http-error.ts';
import { authOf } from '../../http/require-role.ts';
import { downloadFileName } from '../print/index.ts';
import type { PatternsService } from '../patterns/patterns.service.ts';
import type { TransferService } from './transfer.service.ts';

/** multer with our limits, its errors turned into ours (413 too large, 400 wrong field). */
function upload(limitBytes: number): RequestHandler {
  const single = multer({ storage: multer.memoryStorage(), limits: { fileSize: limitBytes, files: 1, fields: 10, parts: 12 } }).single('file');
  return (req, res, next) => {
    if (!req.is('multipart/form-data')) return next();
    single(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'payload_too_large', `file must be at most ${Math.round(limitBytes / 1024)} KB`, { file: `file must be at most ${Math.round(limitBytes / 1024)} KB` }));
        return next(badInput({ file: `file: upload one pattern file in the form field "file" (${err.code})` }));
      }
      next(err);
    });
  };
}

export function transferRoutes(transfer: TransferService, patterns: PatternsService, config: Config): Router {
  const r = Router();
  route(r, 'patterns.export', async (req, res) => {
    const { file, name } = await transfer.exportFile(authOf(req), param(req, 'id'));
    const fileName = downloadFileName({ patternName: name, format: 'svg' }).replace(/\.svg$/, '.latchet.json');
    res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
    res.json(file);
  });
  route(r, 'patterns.import', upload(config.importLimitBytes), async (req, res) => {
    const text = req.file ? req.file.buffer.toString('utf8') : req.is('application/json') ? JSON.stringify(req.body) : undefined;
    if (text === undefined) throw badInput({ file: 'file is required: upload the pattern file in the form field "file"' });
    const id = await transfer.importFile(authOf(req), text);
    const { etag, ...body } = await patterns.get(authOf(req), String(id));
    res.status(201).setHeader('ETag', etag).setHeader('Location', `/api/patterns/${id}`).json(body);
  });
  return r;
}
