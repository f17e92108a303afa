// Vitest globalSetup of the `postgres` project: a throwaway cluster on loopback (or the server
// at TEST_PG_URL), a template database migrated to the latest level once, both handed to
// the test files through provide/inject (tests/pg/setup.ts); all gone after the run.
import type { TestProject } from 'vitest/node';
import { migrateLatest, openDb } from '../../server/db/connection.ts';
import { startPgCluster, type PgCluster } from '../helpers/pg-cluster.ts';
import { createDatabase, databaseUrl, dropDatabase, dropTestDatabases } from '../helpers/pg-test-db.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    pgServerUrl: string;
    pgTemplate: string;
  }
}

export default async function setup(project: TestProject) {
  let cluster: PgCluster | null = null;
  const serverUrl = process.env.TEST_PG_URL || (cluster = await startPgCluster()).url;
  const template = `latchet_template_${process.pid}`;
  try {
    await dropDatabase(serverUrl, template);
    await createDatabase(serverUrl, template);
    const db = openDb(databaseUrl(serverUrl, template));
    try {
      await migrateLatest(db);
    } finally {
      await db.destroy();
    }
  } catch (err) {
    await cluster?.stop();
    throw err;
  }
  project.provide('pgServerUrl', serverUrl);
  project.provide('pgTemplate', template);
  return async () => {
    await dropTestDatabases(serverUrl).catch(() => undefined);
    await dropDatabase(serverUrl, template).catch(() => undefined);
    await cluster?.stop();
  };
}
