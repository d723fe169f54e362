import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express, { type Express } from 'express';
import expressStaticGzip from 'express-static-gzip';

/**
 * Serves the built SPA: hashed assets cached for a year, as the brotli or gzip file the build
 * wrote beside each one when the browser takes it (express-static-gzip picks the file and sets
 * Content-Encoding and Vary), index.html never cached, and every other GET that is not an API
 * route answered with index.html so client routes survive a reload.
 */
export function serveClient(app: Express, clientDir: string): void {
  const indexHtml = join(clientDir, 'index.html');
  app.use(
    '/assets',
    expressStaticGzip(join(clientDir, 'assets'), {
      enableBrotli: true,
      orderPreference: ['br', 'gz'],
      index: false,
      serveStatic: { immutable: true, maxAge: '1y', fallthrough: false },
    }),
  );
  app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
  app.get('/{*splat}', (_req, res) => {
    if (!existsSync(indexHtml)) {
      res.status(503).type('text').send('The Canwright client is not built. Run `npm start` (it builds it) or `npm run build`.');
      return;
    }
    res.set('Cache-Control', 'no-cache').sendFile(indexHtml);
  });
}
