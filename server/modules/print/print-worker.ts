// Worker thread: runs print jobs one at a time off the server's request thread, reporting
// progress. Errors go back as plain data (name, message, field, fields) to be rebuilt.
import { parentPort } from 'node:worker_threads';
import { printRevisionInline } from './print-revision.ts';
import type { JobRequest, WorkerMessage } from './print-job.ts';

const port = parentPort;
if (!port) throw new Error('print-worker.ts runs only as a worker thread');
const post = (m: WorkerMessage, transfer: ArrayBuffer[] = []) => port.postMessage(m, transfer);

port.on('message', async ({ id, job }: JobRequest) => {
  try {
    const f = await printRevisionInline(job.spec, job.options, job.meta, job.format, (p) => post({ id, type: 'progress', progress: p }));
    const body = new Uint8Array(f.body.byteLength);
    body.set(f.body);
    post({ id, type: 'done', body, fileName: f.fileName, contentType: f.contentType }, [body.buffer]);
  } catch (e) {
    const err = e as Error & { field?: string; limit?: string; fields?: { field: string; message: string }[] };
    post({ id, type: 'error', name: err.name ?? 'Error', message: err.message ?? String(e), ...(err.field ? { field: err.field } : {}), ...(err.limit ? { limit: err.limit } : {}), ...(err.fields ? { fields: err.fields } : {}) });
  }
});
