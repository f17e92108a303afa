// Print jobs over HTTP: a long run is posted (202 + Location, RFC 9110 15.3.3), polled for
// progress and fetched when done; the job belongs to the shop (or share link) that started it.
import request from 'supertest';
import { PDFDocument } from 'pdf-lib';
import { afterEach, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp, type TestAppOptions } from '../helpers/test-app.ts';
import { buildWorld, type ShopWorld } from '../helpers/shop-world.ts';
import { binary, heldPrints, pollJob, postJob, steppedPrints, type JobBody } from '../helpers/print-jobs.ts';
import { freezeDate } from '../helpers/frozen-date.ts';
import { DEFAULT_PRINT_JOB_LIMITS } from '../../server/modules/downloads/print-job-table.ts';

let t: TestApp | undefined;
afterEach(async () => {
  await t?.close();
  t = undefined;
});

const IN = 25.4; // mm per inch, exact (International Yard and Pound Agreement, 1959)
// Five dog-collar girths 10-18 in, 2 in apart (common practice for a graded run).
const RUN = ['XS', 'S', 'M', 'L', 'XL'].map((name, i) => ({ name, girthMm: (10 + 2 * i) * IN }));

async function world(options: TestAppOptions = {}): Promise<{ t: TestApp; w: ShopWorld; jobs: string }> {
  t = await createTestApp(options);
  const w = await buildWorld(t);
  const spec = { ...w.collar.head.spec!, sizes: RUN };
  await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec, note: 'graded XS-XL' }).expect(201);
  return { t, w, jobs: `/api/patterns/${w.collar.pattern.id}/revisions/2/print-jobs` };
}

const pages = async (pdf: Buffer) => (await PDFDocument.load(pdf)).getPageCount();

describe('print jobs', () => {
  it('when a five-size run is posted, then progress only grows, it ends done, and its PDF has the synchronous download\'s pages', async () => {
    // One progress message per poll: the states in between are seen however fast it prints.
    const stepped = steppedPrints();
    const { t, w, jobs } = await world({ deps: { printRunner: stepped.run } });
    const res = await request(t.app).post(jobs).set('Cookie', w.apprentice.cookie).send({ paper: 'letter', size: 'all' }).expect(202);
    const job = res.body.job as JobBody;
    expect(res.headers.location).toBe(`/api/print-jobs/${job.id}`);
    expect(job.state).toBe('queued');
    expect(job.fileName).toMatch(/-r2-all-sizes-letter\.pdf$/);

    const seen = await pollJob(t.app, res.headers.location!, w.apprentice.cookie, 5, 60_000, stepped.step);
    const last = seen[seen.length - 1]!;
    expect(last.state, JSON.stringify(last.error)).toBe('done');
    expect(last.progress).toBe(1);
    expect(last.done).toBe(last.total);
    const progress = seen.map((s) => s.progress);
    for (let i = 1; i < progress.length; i++) expect(progress[i]!).toBeGreaterThanOrEqual(progress[i - 1]!);
    // Progress was seen part way, in the page stage: layout of 5 sizes, then every page.
    expect(seen.some((s) => s.state === 'running' && s.progress > 0 && s.progress < 1)).toBe(true);
    expect(seen.some((s) => s.stage === 'layout' || s.stage === 'pages')).toBe(true);

    const file = await binary(request(t.app).get(last.fileUrl).set('Cookie', w.apprentice.cookie)).expect(200);
    expect(file.headers['content-type']).toMatch(/application\/pdf/);
    expect(file.headers['content-disposition']).toContain(job.fileName);
    const sync = await binary(request(t.app).get(jobs.replace('/print-jobs', '/pdf?paper=letter&size=all')).set('Cookie', w.apprentice.cookie)).expect(200);
    expect(await pages(file.body as Buffer)).toBe(await pages(sync.body as Buffer));
    expect(last.total).toBe(await pages(sync.body as Buffer));
    // The same revision and options give the same bytes (fixed metadata dates).
    expect(Buffer.compare(file.body as Buffer, sync.body as Buffer)).toBe(0);
  });

  it('when the file is asked for before the job is done, then 409 says the state', async () => {
    const held = heldPrints();
    const { t, w, jobs } = await world({ deps: { printRunner: held.run } });
    const job = await postJob(t.app, jobs, { size: 'all' }, w.maker.cookie);
    const res = await request(t.app).get(job.fileUrl).set('Cookie', w.maker.cookie).expect(409);
    expect(res.body.error.code).toBe('print_job_not_done');
    expect(res.body.error.job.id).toBe(job.id);
    held.release();
    await pollJob(t.app, job.url, w.maker.cookie, 20);
  });

  it("when another shop's member asks for a job, its file, or posts on the pattern, then each answers 404", async () => {
    const { t, w, jobs } = await world();
    const job = await postJob(t.app, jobs, { size: 'M' }, w.owner.cookie);
    await request(t.app).get(job.url).set('Cookie', w.outsider.cookie).expect(404);
    await request(t.app).get(job.fileUrl).set('Cookie', w.outsider.cookie).expect(404);
    await request(t.app).post(jobs).set('Cookie', w.outsider.cookie).send({}).expect(404);
    // The shop's own apprentice sees it: the job belongs to the shop, not to the one who posted it.
    await pollJob(t.app, job.url, w.apprentice.cookie, 20);
  });

  it('when options are bad, then 400 names each option and its limit, and nothing is queued', async () => {
    const { t, w, jobs } = await world({ deps: { printJobs: { maxPendingPerOwner: 1 } } });
    const cases: [object, string, RegExp][] = [
      [{ paper: 'a5' }, 'paper', /letter/],
      [{ margin: '2in' }, 'margin', /25\.4 mm/],
      [{ overlap: 'wide' }, 'overlap', /unit/],
      [{ size: 'XXL' }, 'size', /XS, S, M, L, XL/],
      [{ format: 'png' }, 'format', /pdf, svg, cutter\.svg/],
      [{ scale: 0.97 }, 'scale', /not a print option/],
      [{ paper: 'custom', width: '24in' }, 'length', /roll length/],
    ];
    for (const [body, field, limit] of cases) {
      const res = await request(t.app).post(jobs).set('Cookie', w.maker.cookie).send(body).expect(400);
      expect(Object.keys(res.body.error.fields ?? {}), JSON.stringify(res.body)).toContain(field);
      expect(res.body.error.fields[field]).toMatch(limit);
    }
    // With room for one job per shop, a good one is still accepted: the bad ones took no place.
    await postJob(t.app, jobs, { paper: 'a4', size: 'S' }, w.maker.cookie);
  });

  it("when a shop's share of the queue is full, then the next job answers 429 with Retry-After, and is accepted once one finishes", async () => {
    const held = heldPrints();
    const { t, w, jobs } = await world({ deps: { printJobs: { maxPendingPerOwner: 2 }, printRunner: held.run } });
    const answers = await Promise.all([0, 1, 2].map(() => request(t.app).post(jobs).set('Cookie', w.maker.cookie).send({ size: 'all' })));
    held.release();
    expect(answers.map((a) => a.status).sort()).toEqual([202, 202, 429]);
    const full = answers.find((a) => a.status === 429)!;
    expect(full.body.error.code).toBe('print_queue_full');
    expect(full.body.error.message).toMatch(/At most 2 print jobs/);
    expect(Number(full.headers['retry-after'])).toBeGreaterThan(0);
    const first = answers.find((a) => a.status === 202)!.body.job as JobBody;
    await pollJob(t.app, first.url, w.maker.cookie, 20);
    await postJob(t.app, jobs, { size: 'all' }, w.maker.cookie);
  });

  it('when the whole queue is full, then another shop is refused too (429, server scope)', async () => {
    const held = heldPrints();
    const { t, w, jobs } = await world({ deps: { printJobs: { maxPending: 1 }, printRunner: held.run } });
    const own = await postJob(t.app, jobs, { size: 'all' }, w.maker.cookie);
    const outsiderPattern = await request(t.app).post('/api/patterns').set('Cookie', w.outsider.cookie).send({ name: 'Bosun lead', kind: 'collar', spec: w.collar.head.spec }).expect(201);
    const res = await request(t.app).post(`/api/patterns/${outsiderPattern.body.pattern.id}/revisions/1/print-jobs`).set('Cookie', w.outsider.cookie).send({}).expect(429);
    expect(res.body.error.scope).toBe('server');
    held.release();
    await pollJob(t.app, own.url, w.maker.cookie, 20);
  });

  it('when one size of a saved run cannot be drawn, then the job ends failed naming the field, and its file answers 422 with the problem', async () => {
    t = await createTestApp();
    const w = await buildWorld(t);
    // A 100 mm size: the collar preset's five tip holes 3/4 in apart need 152.4 mm (the engine's limit).
    // Saves refuse such a size now, so the revision is written as an older engine would have
    // stored it: straight into the table, as the next head.
    const spec = { ...w.collar.head.spec!, sizes: [RUN[0]!, { name: 'kitten', girthMm: 100 }] };
    const pid = w.collar.pattern.id;
    await t.db('revisions').insert({ pattern_id: pid, number: 2, spec: JSON.stringify(spec), engine_version: '0.9.0', author_id: w.maker.id, note: 'kitten size', restored_from: null, created_at: Date.now() });
    await t.db('patterns').where({ id: pid }).update({ head_number: 2 });
    const job = await postJob(t.app, `/api/patterns/${w.collar.pattern.id}/revisions/2/print-jobs`, { size: 'all' }, w.maker.cookie);
    const last = (await pollJob(t.app, job.url, w.maker.cookie, 20)).pop()!;
    expect(last.state).toBe('failed');
    expect(last.error?.code).toBe('invalid_input');
    // The collar shows inches: five holes 3/4 in apart need 152.4 mm = 6 in from the tip.
    expect(last.error?.message).toMatch(/need 6 in from the tip/);
    const file = await request(t.app).get(job.fileUrl).set('Cookie', w.maker.cookie).expect(422);
    expect(file.body.error.message).toMatch(/Tip holes/);
    expect(file.body.error.message).not.toMatch(/pieces\.|[a-z][A-Z]/);
    expect(Object.keys(file.body.error.fields ?? {}).length).toBeGreaterThan(0);
  });

  it('when a finished job outlives its keep time (15 min), then it answers 404; a millisecond before, it is still there', async () => {
    // The clock is frozen and moved by hand: a busy machine cannot make the job expire early.
    const clock = freezeDate();
    const { t, w, jobs } = await world();
    const job = await postJob(t.app, jobs, { size: 'M' }, w.maker.cookie);
    const done = (await pollJob(t.app, job.url, w.maker.cookie, 10)).pop()!;
    expect(done.state).toBe('done');
    const keepMs = DEFAULT_PRINT_JOB_LIMITS.keepMs;
    expect(Date.parse(done.expiresAt)).toBe(clock.now() + keepMs);
    clock.advance(keepMs - 1);
    await request(t.app).get(job.url).set('Cookie', w.maker.cookie).expect(200);
    clock.advance(1);
    const res = await request(t.app).get(job.url).set('Cookie', w.maker.cookie).expect(404);
    expect(res.body.error.message).toMatch(/expired/);
  });

  it('when a share link starts a job, then the link reaches it and its file, and revoking the link hides it', async () => {
    const { t, w } = await world();
    const share = await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/share`).set('Cookie', w.maker.cookie).send({}).expect(201);
    const token = share.body.share.token as string;
    const res = await request(t.app).post(`/api/s/${token}/print-jobs`).send({ paper: 'a4', size: 'all', jobSheet: true }).expect(202);
    const job = res.body.job as JobBody;
    expect(res.headers.location).toBe(`/api/s/${token}/print-jobs/${job.id}`);
    const last = (await pollJob(t.app, job.url)).pop()!;
    expect(last.state).toBe('done');
    const file = await binary(request(t.app).get(last.fileUrl)).expect(200);
    expect(await pages(file.body as Buffer)).toBe(last.total);
    // A member's session does not reach a link's job by the member route.
    await request(t.app).get(`/api/print-jobs/${job.id}`).set('Cookie', w.maker.cookie).expect(404);
    await request(t.app).delete(`/api/share/${share.body.share.id}`).set('Cookie', w.maker.cookie).expect(204);
    await request(t.app).get(job.url).expect(404);
  });
});
