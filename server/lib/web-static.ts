import express, { type NextFunction, type Request, type Response } from 'express';
import fs from 'node:fs';
import path from 'node:path';

/** Encodings the build writes beside each text file (scripts/lib/precompress.ts), best first. */
export const PRECOMPRESSED = [
  { encoding: 'br', ext: '.br' },
  { encoding: 'gzip', ext: '.gz' },
] as const;

// Expo names bundles `entry-<32 hex>.js` and assets `<name>.<32 hex>[@2x].<ext>`: a new build means a new name.
const CONTENT_HASHED = /[.-][0-9a-f]{20,}(@\d+(\.\d+)?x)?\.[a-z0-9]+$/i;

/** Whether a file's name carries a hash of its content, so it can be kept for a year without asking again. */
export const isContentHashed = (file: string) => CONTENT_HASHED.test(file);

function setCacheHeaders(res: Response, file: string) {
  if (isContentHashed(file)) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
  // Everything else (index.html, the service worker, the manifest, versioned wasm) is checked on every use.
  else res.setHeader('Cache-Control', 'no-cache');
}

function acceptedEncodings(req: Request): string[] {
  const header = String(req.headers['accept-encoding'] ?? '');
  return header
    .split(',')
    .map((part) => part.trim().split(';'))
    .filter(([, q]) => !q || Number(q.trim().replace(/^q=/, '')) > 0)
    .map(([name]) => name.trim().toLowerCase());
}

/** Serves `file.br` or `file.gz` made at build time when the browser accepts it; otherwise lets express.static answer. */
function precompressed(webDir: string) {
  const root = path.resolve(webDir);
  return (req: Request, res: Response, next: NextFunction) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    let rel: string;
    try { rel = decodeURIComponent(req.path); } catch { return next(); }
    const file = path.resolve(root, `.${rel}`);
    if (!file.startsWith(root + path.sep)) return next();
    const accepted = acceptedEncodings(req);
    for (const { encoding, ext } of PRECOMPRESSED) {
      if (!accepted.includes(encoding) || !fs.existsSync(file + ext)) continue;
      res.setHeader('Content-Encoding', encoding);
      res.setHeader('Vary', 'Accept-Encoding');
      res.type(path.extname(file));
      setCacheHeaders(res, file);
      // The folder itself may sit under a dot-folder; the request path was checked against it above.
      return res.sendFile(file + ext, { cacheControl: false, lastModified: true, dotfiles: 'allow' });
    }
    next();
  };
}

/**
 * The built web app: precompressed files first, plain ones after, and the app shell for client-side routes
 * (e.g. /sites/3, /l/CODE) on a hard refresh.
 */
export function webStatic(webDir: string) {
  const router = express.Router();
  router.use(precompressed(webDir));
  router.use(
    express.static(webDir, {
      index: false,
      cacheControl: false,
      setHeaders: (res, file) => setCacheHeaders(res, file),
    }),
  );
  router.get(/^(?!\/api\/).*/, (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(path.join(webDir, 'index.html'), { cacheControl: false, dotfiles: 'allow' });
  });
  return router;
}
