// The 1:1 promise end to end through HTTP: the collar PDF as a member downloads it (and as a
// print job hands it over), rendered at 1200 dpi with antialiasing off, both calibration
// squares measured on every page: 1 in = 1200 px and 25 mm = 1181.1 px within 0.1 %
// (1 in = 25.4 mm, International Yard and Pound Agreement 1959).
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parsePrintOptions } from '../../server/modules/print/print-options.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, type ShopWorld } from '../helpers/shop-world.ts';
import { binary, pollJob, postJob } from '../helpers/print-jobs.ts';
import { measurePdfSquares, scaleError } from './measure-squares.ts';
import { writeOut } from './pdf-tools.ts';

let t: TestApp;
let w: ShopWorld;
beforeAll(async () => {
  t = await createTestApp();
  w = await buildWorld(t);
});
afterAll(async () => {
  await t.close();
});

async function expectTrue(name: string, pdf: Buffer, paper: string) {
  const path = writeOut(`http-${name}.pdf`, pdf);
  const readings = await measurePdfSquares(path, pdf, parsePrintOptions({ paper }));
  expect(readings.length).toBeGreaterThanOrEqual(2);
  for (const r of readings) {
    expect(scaleError(r.widthPx, r.square), `page ${r.page} square ${r.square} width ${r.widthPx} px`).toBeLessThan(0.001);
    expect(scaleError(r.heightPx, r.square), `page ${r.page} square ${r.square} height ${r.heightPx} px`).toBeLessThan(0.001);
  }
}

describe('calibration squares of PDFs served over HTTP, 1200 dpi, antialiasing off', () => {
  for (const paper of ['letter', 'a4']) {
    it(`when the apprentice downloads the collar on ${paper}, then both squares on every page read true within 0.1 %`, async () => {
      const res = await binary(request(t.app).get(`/api/patterns/${w.collar.pattern.id}/revisions/1/pdf?paper=${paper}`).set('Cookie', w.apprentice.cookie)).expect(200);
      await expectTrue(`collar-${paper}`, res.body as Buffer, paper);
    });
  }

  it('when the collar on A4 comes from a print job, then its squares read true within 0.1 % too', async () => {
    const job = await postJob(t.app, `/api/patterns/${w.collar.pattern.id}/revisions/1/print-jobs`, { paper: 'a4', jobSheet: true }, w.maker.cookie);
    const last = (await pollJob(t.app, job.url, w.maker.cookie, 20)).pop()!;
    const res = await binary(request(t.app).get(last.fileUrl).set('Cookie', w.maker.cookie)).expect(200);
    await expectTrue('collar-a4-job', res.body as Buffer, 'a4');
  });
});
