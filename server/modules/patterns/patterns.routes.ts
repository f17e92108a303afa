// Library and revision routes (paths and roles from the permission table).
import { Router } from 'express';
import { CreatePatternSchema, DuplicateSchema, ListPatternsQuerySchema, SaveRevisionSchema, UpdatePatternSchema } from '@shared/schemas/library.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { validate } from '../../http/validate.ts';
import { parseOr400 } from '../../http/zod-fields.ts';
import type { RevisionsService } from '../revisions/revisions.service.ts';
import type { PatternsService } from './patterns.service.ts';

export function patternsRoutes(patterns: PatternsService, revisions: RevisionsService): Router {
  const r = Router();

  route(r, 'patterns.list', async (req, res) => {
    res.json(await patterns.list(authOf(req), parseOr400(ListPatternsQuerySchema, req.query)));
  });
  route(r, 'patterns.create', validate(CreatePatternSchema), async (req, res) => {
    const { etag, ...body } = await patterns.create(authOf(req), req.body);
    res.status(201).setHeader('ETag', etag).setHeader('Location', `/api/patterns/${body.pattern.id}`).json(body);
  });
  route(r, 'patterns.read', async (req, res) => {
    const { etag, ...body } = await patterns.get(authOf(req), param(req, 'id'));
    res.setHeader('ETag', etag).json(body);
  });
  route(r, 'patterns.update', validate(UpdatePatternSchema), async (req, res) => {
    res.json({ pattern: await patterns.update(authOf(req), param(req, 'id'), req.body) });
  });
  route(r, 'patterns.duplicate', validate(DuplicateSchema), async (req, res) => {
    const { etag, ...body } = await patterns.duplicate(authOf(req), param(req, 'id'), req.body);
    res.status(201).setHeader('ETag', etag).setHeader('Location', `/api/patterns/${body.pattern.id}`).json(body);
  });
  route(r, 'patterns.follow', async (req, res) => {
    res.json(await patterns.follow(authOf(req), param(req, 'id'), true));
  });
  route(r, 'patterns.unfollow', async (req, res) => {
    res.json(await patterns.follow(authOf(req), param(req, 'id'), false));
  });
  route(r, 'patterns.activity', async (req, res) => {
    res.json(await patterns.activity(authOf(req), param(req, 'id')));
  });

  route(r, 'revisions.list', async (req, res) => {
    res.json({ items: await revisions.list(authOf(req), param(req, 'id')) });
  });
  route(r, 'revisions.read', async (req, res) => {
    const { etag, revision } = await revisions.get(authOf(req), param(req, 'id'), param(req, 'n'));
    res.setHeader('ETag', etag).json({ revision });
  });
  route(r, 'revisions.create', validate(SaveRevisionSchema), async (req, res) => {
    const { etag, revision } = await revisions.save(authOf(req), param(req, 'id'), req.get('If-Match'), req.body);
    res.status(201).setHeader('ETag', etag).setHeader('Location', `/api/patterns/${param(req, 'id')}/revisions/${revision.number}`).json({ revision });
  });
  route(r, 'revisions.restore', async (req, res) => {
    const { etag, revision } = await revisions.restore(authOf(req), param(req, 'id'), param(req, 'n'), req.get('If-Match'));
    res.status(201).setHeader('ETag', etag).setHeader('Location', `/api/patterns/${param(req, 'id')}/revisions/${revision.number}`).json({ revision });
  });
  return r;
}
