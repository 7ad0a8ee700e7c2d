import { existsSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import express, { Router } from 'express';
import { withBootShell } from './boot-shell';

/** Serves the exported web app: files first, then index.html for app routes (paths without an extension). */
export function webAppRouter(distDir: string) {
  const router = Router();
  const root = path.resolve(distDir);
  const indexHtml = path.join(root, 'index.html');
  let page: { mtimeMs: number; html: string } | null = null;
  const indexPage = () => {
    const { mtimeMs } = statSync(indexHtml);
    if (!page || page.mtimeMs !== mtimeMs) page = { mtimeMs, html: withBootShell(readFileSync(indexHtml, 'utf8')) };
    return page.html;
  };
  router.use(express.static(root, { index: false, maxAge: '1h', setHeaders: cacheHeaders }));
  router.get('/{*splat}', (req, res) => {
    if (path.extname(req.path)) {
      res.status(404).type('text').send('Not found');
    } else if (existsSync(indexHtml)) {
      res.setHeader('Cache-Control', 'no-cache');
      res.type('html').send(indexPage());
    } else {
      res.status(503).type('text').send('The web app is not built yet: run `npm run web:build`.');
    }
  });
  return router;
}

function cacheHeaders(res: express.Response, filePath: string) {
  // Exported bundles carry a content hash in their names; they never change.
  if (/[\\/]_expo[\\/]static[\\/]/.test(filePath)) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
}
