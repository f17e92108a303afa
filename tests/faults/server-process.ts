// The real server as a child process (node + tsx, server/index.ts) on a given database file,
// so a fault test can SIGKILL it like a power cut and start it again.
import { spawn, type ChildProcess } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));

export interface ServerProcess {
  url: string;
  child: ChildProcess;
  /** SIGKILL: no shutdown code runs, as in a crash or power cut. Resolves when it is gone. */
  kill(): Promise<void>;
  /** SIGTERM: the graceful stop. */
  stop(): Promise<void>;
}

/** Starts the server on `databaseFile` (already migrated) on a free loopback port. */
export function startServerProcess(databaseFile: string, env: Record<string, string> = {}): Promise<ServerProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    env: { ...process.env, NODE_ENV: 'test', HOST: '127.0.0.1', PORT: '0', DATABASE_FILE: databaseFile, SMTP_HOST: '', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  let output = '';
  return new Promise((resolve, reject) => {
    const onData = (chunk: Buffer) => {
      output += chunk.toString('utf8');
      const m = /listening on (http:\/\/\S+)/.exec(output);
      if (!m) return;
      child.stdout!.off('data', onData);
      const url = m[1]!.replace('localhost', '127.0.0.1');
      const signal = (s: NodeJS.Signals) => async () => {
        if (child.exitCode === null && child.signalCode === null) child.kill(s);
        await exited;
      };
      resolve({ url, child, kill: signal('SIGKILL'), stop: signal('SIGTERM') });
    };
    child.stdout!.on('data', onData);
    child.stderr!.on('data', (c: Buffer) => (output += c.toString('utf8')));
    child.once('exit', (code) => reject(new Error(`server exited (${code}) before listening:\n${output}`)));
  });
}
