// A private, throwaway PostgreSQL cluster for the test run: initdb into a temporary folder,
// started with pg_ctl on 127.0.0.1 and a free port, trust authentication for the one local
// role, durability switched off (nothing here must survive), deleted when stopped.
// initdb refuses to run as root, so under root it runs as the `postgres` system user
// (Debian's package creates it) through runuser.
import { execFile, spawn } from 'node:child_process';
import { chownSync, existsSync, mkdtempSync, readdirSync, rmSync, readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';

const run = promisify(execFile);

/** The apt-get package that provides initdb and pg_ctl (the preflight names it). */
export const POSTGRES_APT_PACKAGE = 'postgresql';
/** The superuser the cluster is created with. */
export const PG_TEST_ROLE = 'latchet';

/** The folder holding initdb, pg_ctl and postgres: PG_BIN_DIR, Debian's newest, or PATH. */
export function postgresBinDir(): string | null {
  const has = (dir: string) => existsSync(join(dir, 'initdb')) && existsSync(join(dir, 'pg_ctl'));
  if (process.env.PG_BIN_DIR) return has(process.env.PG_BIN_DIR) ? process.env.PG_BIN_DIR : null;
  const debian = '/usr/lib/postgresql';
  if (existsSync(debian)) {
    const versions = readdirSync(debian).filter((v) => /^\d+$/.test(v)).sort((a, b) => Number(b) - Number(a));
    for (const v of versions) if (has(join(debian, v, 'bin'))) return join(debian, v, 'bin');
  }
  for (const dir of (process.env.PATH ?? '').split(':')) if (dir && has(dir)) return dir;
  return null;
}

export interface PgCluster {
  /** e.g. postgres://latchet@127.0.0.1:41234/postgres */
  url: string;
  stop(): Promise<void>;
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

async function idOf(user: string, flag: '-u' | '-g'): Promise<number> {
  return Number((await run('id', [flag, user])).stdout.trim());
}

/** Start a new cluster; call stop() when done (it removes every file). */
export async function startPgCluster(): Promise<PgCluster> {
  const bin = postgresBinDir();
  if (!bin) throw new Error(`PostgreSQL binaries not found; install with: sudo apt-get install -y ${POSTGRES_APT_PACKAGE}`);
  const dir = mkdtempSync(join(tmpdir(), 'latchet-pg-'));
  const data = join(dir, 'data');
  const asRoot = process.getuid?.() === 0;
  const user = 'postgres';
  if (asRoot) chownSync(dir, await idOf(user, '-u'), await idOf(user, '-g'));
  const pg = (tool: string, args: string[]) =>
    asRoot ? run('runuser', ['-u', user, '--', join(bin, tool), ...args]) : run(join(bin, tool), args);

  try {
    await pg('initdb', ['-D', data, '--no-sync', '-A', 'trust', '-U', PG_TEST_ROLE, '-E', 'UTF8', '--locale=C']);
    let port = 0;
    for (let attempt = 1; ; attempt += 1) {
      port = await freePort();
      const options = [
        '-c listen_addresses=127.0.0.1',
        `-p ${port}`,
        `-k ${dir}`,
        '-c fsync=off -c synchronous_commit=off -c full_page_writes=off',
        '-c max_connections=300 -c shared_buffers=32MB',
      ].join(' ');
      try {
        await pg('pg_ctl', ['-D', data, '-l', join(dir, 'server.log'), '-w', '-t', '60', '-o', options, 'start']);
        break;
      } catch (err) {
        // Another process may have taken the port between our probe and postgres binding it.
        if (attempt >= 3) throw err;
      }
    }
    // If this process dies without stop() (killed, Ctrl+C, a timeout), a detached watchdog
    // stops the cluster and deletes its folder, so no postgres is left running.
    const pgCtl = (asRoot ? ['runuser', '-u', user, '--', join(bin, 'pg_ctl')] : [join(bin, 'pg_ctl')]).map((a) => `'${a}'`).join(' ');
    const watchdog = `while kill -0 ${process.pid} 2>/dev/null; do sleep 2; done; ${pgCtl} -D '${data}' -m immediate stop >/dev/null 2>&1; rm -rf '${dir}'`;
    spawn('sh', ['-c', watchdog], { detached: true, stdio: 'ignore' }).unref();
    let stopped = false;
    return {
      url: `postgres://${PG_TEST_ROLE}@127.0.0.1:${port}/postgres`,
      async stop() {
        if (stopped) return;
        stopped = true;
        await pg('pg_ctl', ['-D', data, '-m', 'immediate', '-w', 'stop']).catch(() => undefined);
        rmSync(dir, { recursive: true, force: true });
      },
    };
  } catch (err) {
    const log = existsSync(join(dir, 'server.log')) ? readFileSync(join(dir, 'server.log'), 'utf8').slice(-2000) : '';
    rmSync(dir, { recursive: true, force: true });
    throw new Error(`could not start a test PostgreSQL cluster: ${(err as Error).message}\n${log}`, { cause: err });
  }
}
