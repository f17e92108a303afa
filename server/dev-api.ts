// The API half of `npm run dev` (restarted by tsx watch on every change).
import { configOrExit } from './index.ts';
import { boot } from './boot.ts';

const config = configOrExit();
const running = await boot(config);
console.log(`API listening on ${running.url}; ${running.mailNote} (owners read it at ${running.url}/dev/mail)`);
