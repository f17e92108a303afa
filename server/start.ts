// `npm start`: migrate + seed, build the client with Vite's JS API, serve both on one port.
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import { configOrExit } from './index.ts';
import { boot, demoSignIns } from './boot.ts';

const config = configOrExit();
const started = Date.now();
console.log('building the client (vite)...');
await build({ configFile: fileURLToPath(new URL('../vite.config.ts', import.meta.url)), logLevel: 'warn', mode: 'production' });
console.log(`client built in ${((Date.now() - started) / 1000).toFixed(1)} s`);
const running = await boot(config);
console.log(`\nLatchet is running at ${running.url}\n\n${demoSignIns()}\n\n${running.mailNote}${running.mailNote.startsWith("fake") ? `; an owner reads it at ${running.url}/dev/mail` : ""}\nStop with Ctrl+C.`);
