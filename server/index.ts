// The server process: config, database, listen, and a graceful stop on SIGTERM/SIGINT.
import type { Server } from 'node:http';
import type { Knex } from 'knex';
import { createApp, internalsOf, type AppDeps } from './app.ts';
import { stopPrintWorker } from './modules/print/index.ts';
import { ConfigError, loadConfig, type Config } from './config.ts';
import { openDb } from './db/connection.ts';

export interface RunningServer {
  server: Server;
  db: Knex;
  config: Config;
  url: string;
  /** Stops accepting, lets open requests finish (up to 10 s), closes the database. */
  stop(): Promise<void>;
}

/** Reads the environment or exits with the list of problems. */
export function configOrExit(): Config {
  try {
    return loadConfig();
  } catch (err) {
    if (err instanceof ConfigError) {
      console.error(err.message);
      process.exit(1);
    }
    throw err;
  }
}

/** Opens the database and listens on config.port; the caller has migrated already. */
export async function listen(config: Config, db: Knex = openDb(config), mail?: AppDeps['mail']): Promise<RunningServer> {
  const app = createApp({ db, config, ...(mail ? { mail } : {}) });
  const server = app.listen(config.port, config.host);
  await new Promise<void>((resolve, reject) => server.once('listening', resolve).once('error', reject));
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.port;
  let stopping: Promise<void> | undefined;
  const stop = () =>
    (stopping ??= (async () => {
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeIdleConnections();
      const force = setTimeout(() => server.closeAllConnections(), 10_000);
      await closed;
      clearTimeout(force);
      // Mail queued by the last requests leaves before the database closes; a print worker
      // thread would otherwise keep the process alive.
      await internalsOf(app).outbox.flush().catch((err: Error) => console.error(`mail on shutdown: ${err.message}`));
      await stopPrintWorker();
      await db.destroy();
    })());
  return { server, db, config, url: `http://localhost:${port}`, stop };
}

/** Stop `running` on SIGTERM or SIGINT, then exit. */
export function stopOnSignals(stops: Array<() => Promise<void>>): void {
  const onSignal = (signal: NodeJS.Signals) => {
    console.log(`\n${signal}: finishing open requests and closing the database...`);
    Promise.all(stops.map((s) => s()))
      .then(() => process.exit(0))
      .catch((err) => {
        console.error(err);
        process.exit(1);
      });
  };
  process.once('SIGTERM', onSignal);
  process.once('SIGINT', onSignal);
}

// `node --import tsx server/index.ts`: serve an already migrated database.
if (import.meta.url === `file://${process.argv[1]}`) {
  const config = configOrExit();
  const running = await listen(config);
  console.log(`Latchet API listening on ${running.url}`);
  stopOnSignals([running.stop]);
}
