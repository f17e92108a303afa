// GET /api/patterns/:id/revisions/:n/thumbnail.svg: the library card's picture of a revision.
import { Router } from 'express';
import { computeLayout, drawLayout, ENGINE_VERSION } from '@shared/pattern/index.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { patternOr404 } from '../patterns/pattern-access.ts';
import type { RevisionsService } from '../revisions/revisions.service.ts';
import { buildThumbnailSvg } from './thumbnail-svg.ts';

/** Shown for a revision the current engine cannot draw: the card keeps its shape. */
const EMPTY = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 100 10"><rect x="0.5" y="0.5" width="99" height="9" fill="none" stroke="#cfa676" stroke-dasharray="2 2"/></svg>';

export function thumbnailRoutes(deps: LibraryDeps, revisions: RevisionsService): Router {
  const r = Router();
  route(r, 'print.thumbnail', async (req, res) => {
    const p = await patternOr404(deps.repos.patterns, param(req, 'id'), authOf(req).shop.id);
    const revision = await revisions.revisionOr404(p.id, param(req, 'n'));
    let svg = EMPTY;
    try {
      const spec = JSON.parse(revision.spec) as StrapSpec;
      svg = buildThumbnailSvg(drawLayout(computeLayout(spec), spec));
    } catch {
      // An older revision the engine now refuses still lists; its editor says why.
    }
    // A revision never changes; the drawing changes only with the engine, so both make the tag.
    res.setHeader('ETag', `"thumb-p${p.id}-r${revision.number}-e${ENGINE_VERSION}"`);
    res.setHeader('Cache-Control', 'private, max-age=3600');
    res.type('image/svg+xml').send(svg);
  });
  return r;
}
