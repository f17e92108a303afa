// Print jobs over HTTP: POST starts one (202 + Location), GET polls it, GET .../file fetches
// the file. Members see their shop's jobs only; a share link's jobs are reached through
// that link only (a revoked link hides them too). Another owner's job answers 404.
import { Router, type Response } from 'express';
import { param, route } from '../../http/allow.ts';
import { authOf } from '../../http/require-role.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { patternOr404 } from '../patterns/pattern-access.ts';
import type { RevisionsService } from '../revisions/revisions.service.ts';
import type { ShareService } from '../share/share.service.ts';
import { sendFile } from './downloads.routes.ts';
import type { JobRecord } from './print-job-table.ts';
import { jobView, type PrintJobsService } from './print-jobs.service.ts';

function accepted(res: Response, job: JobRecord, base: string): void {
  res.status(202).location(base).json({ job: jobView(job, base) });
}

export function printJobsRoutes(deps: LibraryDeps, revisions: RevisionsService, shares: ShareService, jobs: PrintJobsService): Router {
  const r = Router();
  const memberBase = (id: string) => `/api/print-jobs/${id}`;
  const shareBase = (token: string, id: string) => `/api/s/${token}/print-jobs/${id}`;

  route(r, 'print.jobs.create', async (req, res) => {
    const shopId = authOf(req).shop.id;
    const p = await patternOr404(deps.repos.patterns, param(req, 'id'), shopId);
    const revision = await revisions.revisionOr404(p.id, param(req, 'n'));
    const job = jobs.start({ shopId }, p.name, revision, req.body);
    accepted(res, job, memberBase(job.id));
  });
  route(r, 'print.jobs.read', (req, res) => {
    const job = jobs.jobOr404(param(req, 'jobId'), { shopId: authOf(req).shop.id });
    res.json({ job: jobView(job, memberBase(job.id)) });
  });
  route(r, 'print.jobs.file', (req, res) => {
    const job = jobs.jobOr404(param(req, 'jobId'), { shopId: authOf(req).shop.id });
    sendFile(res, jobs.fileOf(job, memberBase(job.id)));
  });

  route(r, 'share.jobs.create', async (req, res) => {
    const token = param(req, 'token')!;
    const { share, revision } = await shares.resolve(token);
    const job = jobs.start({ shareId: share.id }, share.pattern_name, revision, req.body);
    accepted(res, job, shareBase(token, job.id));
  });
  route(r, 'share.jobs.read', async (req, res) => {
    const token = param(req, 'token')!;
    const { share } = await shares.resolve(token);
    const job = jobs.jobOr404(param(req, 'jobId'), { shareId: share.id });
    res.json({ job: jobView(job, shareBase(token, job.id)) });
  });
  route(r, 'share.jobs.file', async (req, res) => {
    const token = param(req, 'token')!;
    const { share } = await shares.resolve(token);
    const job = jobs.jobOr404(param(req, 'jobId'), { shareId: share.id });
    sendFile(res, jobs.fileOf(job, shareBase(token, job.id)));
  });
  return r;
}
