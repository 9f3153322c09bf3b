/**
 * Serves the built client (vite build → dist/): hashed assets cached for a year as immutable,
 * index.html never cached, and every other non-API GET answered with index.html so the client's
 * router can take it. Without a build it says how to make one.
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express, { type Express } from 'express';

export function serveClient(app: Express, distDir: string): void {
  const index = join(distDir, 'index.html');
  app.use(
    '/assets',
    // A missing hashed asset is a 404, never the page (a browser would try to run HTML as a module).
    express.static(join(distDir, 'assets'), {
      immutable: true,
      maxAge: '365d',
      index: false,
      fallthrough: false,
    }),
  );
  app.use(express.static(distDir, { index: false, maxAge: 0 }));
  app.get('/{*splat}', (req, res, next) => {
    if (req.path === '/api' || req.path.startsWith('/api/')) return next();
    if (!existsSync(index)) {
      res
        .status(503)
        .type('text/plain')
        .send(
          'The Reachline client is not built yet. Run `npm run build` (or `npm start`, which builds first), then reload.',
        );
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
}
