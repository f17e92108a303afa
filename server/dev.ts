// `npm run dev`: the API (restarted on change by tsx watch) and the Vite dev server with
// HMR, which proxies /api and /s/ to the API (vite.config.ts).
import concurrently from 'concurrently';
import { configOrExit } from './index.ts';
import { demoSignIns } from './boot.ts';

const config = configOrExit();
const vitePort = Number(process.env.VITE_PORT ?? 5173);
const env = { ...process.env, PORT: String(config.port), PUBLIC_ORIGIN: process.env.PUBLIC_ORIGIN ?? `http://localhost:${vitePort}` };

console.log(`\nLatchet dev: open http://localhost:${vitePort} (Vite, hot reload); API on http://localhost:${config.port}\n\n${demoSignIns()}\n`);
const { result } = concurrently(
  [
    { name: 'api', command: 'node node_modules/tsx/dist/cli.mjs watch --clear-screen=false server/dev-api.ts', env, prefixColor: 'cyan' },
    { name: 'web', command: `node node_modules/vite/bin/vite.js --port ${vitePort} --strictPort`, env, prefixColor: 'magenta' },
  ],
  { killOthersOn: ['failure', 'success'], prefix: 'name' },
);
result.then(
  () => process.exit(0),
  () => process.exit(1),
);
