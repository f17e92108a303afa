// A full disk under the database: a save that cannot be written answers 507 with words a
// person understands, nothing already saved is harmed (PRAGMA integrity_check, SQLite docs),
// reading goes on, and saving works again once space is freed, numbered without a gap.
import { join } from 'node:path';
import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import type { Knex } from 'knex';
import { createApp } from '../../server/app.ts';
import { loadConfig } from '../../server/config.ts';
import { migrateLatest, openDb } from '../../server/db/connection.ts';
import { presetSpec } from '@shared/pattern/index.ts';
import { signUpAgent } from '../helpers/accounts.ts';
import { canMountTmpfs, smallDisk, type SmallDisk } from './small-disk.ts';

let disk: SmallDisk | undefined;
let db: Knex | undefined;
afterEach(async () => {
  await db?.destroy();
  disk?.remove();
  db = undefined;
  disk = undefined;
});

// A real full disk needs a tmpfs (root); the page cap runs everywhere. Both when possible.
const KINDS: SmallDisk['kind'][] = canMountTmpfs() ? ['tmpfs', 'max_page_count'] : ['max_page_count'];

describe.each(KINDS)('disk full (%s)', (kind) => {
  it('when the disk fills up, then a save answers 507 in words, the file passes integrity_check, and saves work again once space is freed', async () => {
    disk = smallDisk(kind);
    const file = join(disk.dir, 'latchet.sqlite3');
    db = openDb(file);
    await migrateLatest(db);
    const errors: unknown[] = [];
    const app = createApp({ db, config: loadConfig({ NODE_ENV: 'test', DATABASE_FILE: file, PORT: '0' }), log: (e) => errors.push(e) });
    const { agent } = await signUpAgent(app);
    const created = await agent.post('/api/patterns').send({ name: 'Collar for Juniper', kind: 'collar', spec: presetSpec('collar') }).expect(201);
    const id = created.body.pattern.id as number;
    let etag = created.headers.etag as string;
    const save = (girthMm: number) => agent.post(`/api/patterns/${id}/revisions`).set('If-Match', etag).send({ spec: { ...presetSpec('collar'), girthMm }, note: `girth ${girthMm}` });
    const second = await save(340).expect(201);
    etag = second.headers.etag as string;

    await disk.fill(db);
    // Pages with room left may take a save or two before one needs space that is not there.
    let refused = await save(350);
    let head = 2;
    for (let girth = 351; refused.status === 201 && girth < 400; girth++) {
      head = refused.body.revision.number as number;
      etag = refused.headers.etag as string;
      refused = await save(girth);
    }
    expect(refused.status).toBe(507);
    expect(refused.body.error.code).toBe('storage_full');
    expect(refused.body.error.message).toMatch(/out of storage space.*not saved/);
    expect(refused.body.error.message).not.toMatch(/SQLITE|ENOSPC|\bat \w+ \(/);
    // The operator's log has the real error.
    expect(errors.map((e) => (e as { code?: string }).code)).toContain('SQLITE_FULL');

    const [integrity] = (await db.raw('PRAGMA integrity_check')) as [{ integrity_check: string }];
    expect(integrity.integrity_check).toBe('ok');
    // Reading still works, and the head is the last acknowledged save.
    const read = await agent.get(`/api/patterns/${id}`).expect(200);
    expect(read.body.head.number).toBe(head);
    expect(read.headers.etag).toBe(etag);

    await disk.free(db);
    const after = await save(400).expect(201);
    expect(after.body.revision.number).toBe(head + 1);
    const rows = (await db('revisions').where({ pattern_id: id }).orderBy('number').select('number', 'note')) as { number: number; note: string }[];
    expect(rows.map((r) => r.number)).toEqual(Array.from({ length: head + 1 }, (_, i) => i + 1));
    expect(rows.slice(1, 2).map((r) => r.note)).toEqual(['girth 340']);
    expect(rows.at(-1)!.note).toBe('girth 400');
    const [whole] = (await db.raw('PRAGMA integrity_check')) as [{ integrity_check: string }];
    expect(whole.integrity_check).toBe('ok');
    await request(app).get('/api/health').expect(200);
  });
});
