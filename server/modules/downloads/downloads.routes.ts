// GET /api/patterns/:id/revisions/:n/pdf|svg|cutter.svg for members.
import { Router, type Response } from 'express';
import type { Action } from '@shared/schemas/permissions.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { patternOr404 } from '../patterns/pattern-access.ts';
import type { ExportFormat, PrintedFile } from '../print/index.ts';
import type { RevisionsService } from '../revisions/revisions.service.ts';
import { attachment, printSaved } from './downloads.service.ts';

/** Sends a printed file as a download. */
export function sendFile(res: Response, file: PrintedFile): void {
  res.setHeader('Content-Type', file.contentType);
  res.setHeader('Content-Disposition', attachment(file.fileName));
  res.send(file.body);
}

export function downloadsRoutes(deps: LibraryDeps, revisions: RevisionsService): Router {
  const r = Router();
  const formats: Array<[Action, ExportFormat]> = [
    ['print.pdf', 'pdf'],
    ['print.svg', 'svg'],
    ['print.cutter', 'cutter.svg'],
  ];
  for (const [action, format] of formats) {
    route(r, action, async (req, res) => {
      const p = await patternOr404(deps.repos.patterns, param(req, 'id'), authOf(req).shop.id);
      const revision = await revisions.revisionOr404(p.id, param(req, 'n'));
      sendFile(res, await printSaved(p.name, revision, format, req.query));
    });
  }
  return r;
}
