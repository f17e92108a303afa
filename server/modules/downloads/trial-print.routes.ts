// POST /api/patterns/:id/trial-print: the form's values as a PDF, nothing saved.
import { Router } from 'express';
import { TrialPrintSchema } from '@shared/schemas/trial-print.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { validate } from '../../http/validate.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { patternOr404 } from '../patterns/pattern-access.ts';
import { sendFile } from './downloads.routes.ts';
import { printTrial, type TrialPrintRequest } from './trial-print.service.ts';

export function trialPrintRoutes(deps: LibraryDeps, now: () => Date = () => new Date()): Router {
  const r = Router();
  route(r, 'print.trial', validate(TrialPrintSchema), async (req, res) => {
    const p = await patternOr404(deps.repos.patterns, param(req, 'id'), authOf(req).shop.id);
    // Not a revision: the browser must not keep it as if it were one.
    res.setHeader('Cache-Control', 'no-store');
    sendFile(res, await printTrial(p.name, req.body as TrialPrintRequest, now()));
  });
  return r;
}
