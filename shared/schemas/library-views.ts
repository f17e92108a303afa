// Response shapes of the library's server modules that the client reads: plain TypeScript
// types (the server builds them, nobody parses them), one definition for both sides.

/** A print job as `POST .../print-jobs` and `GET /api/print-jobs/:jobId` answer it. */
export interface PrintJobView {
  id: string;
  state: 'queued' | 'running' | 'done' | 'failed';
  /** Laying out the sizes, then drawing the pages; null before the worker starts. */
  stage: 'layout' | 'pages' | null;
  /** Sizes laid out or pages drawn so far, of `total` in the current stage. */
  done: number;
  total: number;
  /** 0..1 over both stages, for a progress bar. */
  progress: number;
  format: 'pdf' | 'svg' | 'cutter.svg';
  fileName: string;
  createdAt: string;
  expiresAt: string;
  /** The job's own URL (poll it) and its file's. */
  url: string;
  fileUrl: string;
  error?: { code: string; message: string; fields?: Record<string, string> };
}
