// Share links: create/list/revoke for members; the public read-only view and downloads.
import { Router } from 'express';
import { computeLayout } from '@shared/pattern/compute-layout.ts';
import { drawLayout } from '@shared/pattern/draw-layout.ts';
import { CreateShareSchema } from '@shared/schemas/library.ts';
import type { Action } from '@shared/schemas/permissions.ts';
import type { SharedPattern } from '@shared/schemas/library-views.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import { validate } from '../../http/validate.ts';
import { sendFile } from '../downloads/downloads.routes.ts';
import { printSaved } from '../downloads/downloads.service.ts';
import type { ExportFormat } from '../print/index.ts';
import { iso } from '../patterns/views.ts';
import type { ShareService } from './share.service.ts';

export function shareRoutes(shares: ShareService): Router {
  const r = Router();
  route(r, 'share.list', async (req, res) => {
    res.json(await shares.list(authOf(req), param(req, 'id')));
  });
  route(r, 'share.create', validate(CreateShareSchema), async (req, res) => {
    res.status(201).json(await shares.create(authOf(req), param(req, 'id'), req.body));
  });
  route(r, 'share.revoke', async (req, res) => {
    await shares.revoke(authOf(req), param(req, 'shareId'));
    res.status(204).end();
  });

  // Public: exactly one revision, without notes, authors, ids or links to the rest of the shop.
  route(r, 'share.view', async (req, res) => {
    const token = param(req, 'token')!;
    const { share, revision } = await shares.resolve(token);
    const spec = JSON.parse(revision.spec) as StrapSpec;
    const layout = computeLayout(spec);
    const date = iso(revision.created_at);
    const base = `/api/s/${token}`;
    const view: SharedPattern = {
      shopName: share.shop_name,
      pattern: { name: share.pattern_name, kind: share.pattern_kind },
      revision: { number: revision.number, spec, engineVersion: revision.engine_version, createdAt: date },
      layout,
      drawing: drawLayout(layout, spec, { revision: `rev ${revision.number}`, date: date.slice(0, 10) }),
      downloads: { pdf: `${base}/pdf`, svg: `${base}/svg`, cutterSvg: `${base}/cutter.svg` },
    };
    res.json(view);
  });
  const formats: Array<[Action, ExportFormat]> = [
    ['share.pdf', 'pdf'],
    ['share.svg', 'svg'],
    ['share.cutter', 'cutter.svg'],
  ];
  for (const [action, format] of formats) {
    route(r, action, async (req, res) => {
      const { share, revision } = await shares.resolve(param(req, 'token'));
      sendFile(res, await printSaved(share.pattern_name, revision, format, req.query));
    });
  }
  return r;
}
