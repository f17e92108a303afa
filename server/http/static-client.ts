// Serves the built client (dist/client) with the SPA fallback, when a build exists.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express, { type Express } from 'express';

/** Mounts static files and `'/{*splat}'` -> index.html; returns false when there is no build. */
export function serveClient(app: Express, dir: string): boolean {
  const index = join(dir, 'index.html');
  if (!existsSync(index)) return false;
  // Hashed asset names never change content: cache them for a year; index.html never.
  app.use('/assets', express.static(join(dir, 'assets'), { immutable: true, maxAge: '365d', fallthrough: false }));
  app.use(express.static(dir, { index: false, maxAge: 0 }));
  app.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
  return true;
}
