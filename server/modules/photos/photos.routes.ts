// Photo routes of orders and patterns: list, upload (multipart field "file", optional
// "caption"), the photo and its thumbnail, delete.
import { Router, type RequestHandler, type Response } from 'express';
import multer from 'multer';
import { PhotoCaptionSchema } from '@shared/schemas/orders.ts';
import type { Action } from '@shared/schemas/permissions.ts';
import type { Config } from '../../config.ts';
import { param, route } from '../../http/allow.ts';
import { HttpError, badInput } from '../../http/http-error.ts';
import { authOf } from '../../http/require-role.ts';
import { parseOr400 } from '../../http/zod-fields.ts';
import type { PhotosService, PhotoTarget } from './photos.service.ts';

/** multer in memory with the configured size limit; its errors in our words (413 too large). */
export function photoUpload(config: Config): RequestHandler {
  const kb = Math.round(config.photoMaxBytes / 1024);
  const single = multer({ storage: multer.memoryStorage(), limits: { fileSize: config.photoMaxBytes, files: 1, fields: 5, parts: 8 } }).single('file');
  return (req, res, next) => {
    if (!req.is('multipart/form-data')) return next(badInput({ file: 'Photo is required: choose an image file to upload' }));
    single(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'photo_too_large', `Photo must be at most ${kb >= 1024 ? `${Math.round(kb / 102.4) / 10} MB` : `${kb} KB`}.`, { file: 'Photo is too large' }));
        return next(badInput({ file: 'Photo: upload one image file at a time' }));
      }
      next(err);
    });
  };
}

/** Sends a stored image so no browser runs it as anything else. */
export function sendImage(res: Response, file: { body: Buffer; contentType: string; fileName: string }): void {
  res.setHeader('Content-Type', file.contentType);
  res.setHeader('X-Content-Type-Options', 'nosniff');
  res.setHeader('Content-Disposition', `inline; filename="${file.fileName}"`);
  res.setHeader('Content-Security-Policy', "default-src 'none'; sandbox");
  res.setHeader('Cache-Control', 'private, max-age=3600');
  res.send(file.body);
}

export function photosRoutes(photos: PhotosService, config: Config): Router {
  const r = Router();
  const upload = photoUpload(config);
  const targets: Array<[PhotoTarget, 'orders.photos' | 'patterns.photos']> = [
    ['orders', 'orders.photos'],
    ['patterns', 'patterns.photos'],
  ];
  for (const [target, prefix] of targets) {
    route(r, `${prefix}.list` as Action, async (req, res) => {
      res.json(await photos.list(authOf(req), target, param(req, 'id')));
    });
    route(r, `${prefix}.upload` as Action, upload, async (req, res) => {
      if (!req.file) throw badInput({ file: 'Photo is required: choose an image file to upload' });
      const { caption } = parseOr400(PhotoCaptionSchema, req.body ?? {});
      res.status(201).json(await photos.upload(authOf(req), target, param(req, 'id'), req.file.buffer, caption));
    });
    route(r, `${prefix}.file` as Action, async (req, res) => {
      sendImage(res, await photos.file(authOf(req), target, param(req, 'id'), param(req, 'photoId'), false));
    });
    route(r, `${prefix}.thumb` as Action, async (req, res) => {
      sendImage(res, await photos.file(authOf(req), target, param(req, 'id'), param(req, 'photoId'), true));
    });
    route(r, `${prefix}.delete` as Action, async (req, res) => {
      await photos.remove(authOf(req), target, param(req, 'id'), param(req, 'photoId'));
      res.status(204).end();
    });
  }
  return r;
}
