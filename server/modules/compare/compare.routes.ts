// GET /api/patterns/:id/compare?from=&to= : changed parameters and layout differences.
import { Router } from 'express';
import { CompareQuerySchema } from '@shared/schemas/library.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { parseOr400 } from '../../http/zod-fields.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { compareRevisions } from './compare.service.ts';

export function compareRoutes(deps: LibraryDeps): Router {
  const r = Router();
  route(r, 'patterns.compare', async (req, res) => {
    res.json(await compareRevisions(deps, authOf(req), param(req, 'id'), parseOr400(CompareQuerySchema, req.query)));
  });
  return r;
}
