// GET /api/health: the database answers and which migration it stands at.
import { Router } from 'express';
import type { Knex } from 'knex';
import { migrationLevel } from '../../db/migration-level.ts';

export function healthRoutes(db: Knex): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    try {
      const migration = await migrationLevel(db);
      res.json({ status: migration.pending === 0 ? 'ok' : 'migrations_pending', database: 'reachable', migration });
    } catch {
      res.status(503).json({ error: { code: 'database_unreachable', message: 'The database does not answer.' } });
    }
  });
  return router;
}
