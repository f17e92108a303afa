// setupFiles of the `postgres` project: createTestApp (tests/helpers/test-app.ts) gives each
// test a fresh copy of the migrated template on the run's PostgreSQL server.
import { inject } from 'vitest';

process.env.LATCHET_TEST_PG_URL = inject('pgServerUrl');
process.env.LATCHET_TEST_PG_TEMPLATE = inject('pgTemplate');
