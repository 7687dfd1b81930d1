import { Router, type Response } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser } from '@/server/middleware/auth';
import { pathId, validate } from '@/server/middleware/validate';
import { readPhotoFile } from '@/server/services/photos.service';
import { idParams } from '@/shared/schemas/request';

/** Photos only for signed-in users of the owning organisation; the client fetches them with its token. */
export function photosRoutes({ config, storage }: AppContext) {
  const router = Router();
  // Auth on each route rather than router.use: other routers serve paths under the same prefixes.
  const signedIn = auth(config.jwtSecret);
  // A stored photo never changes, so the browser may keep it; `private` keeps it out of shared caches.
  const sendJpeg = (res: Response, body: Buffer) => res.set('Cache-Control', 'private, max-age=86400, immutable').type('image/jpeg').send(body);
  router.get('/photos/:id', signedIn, validate({ params: idParams }), async (req, res) => {
    sendJpeg(res, await readPhotoFile(currentUser(req), storage!, pathId(req), 'full'));
  });
  router.get('/photos/:id/thumbnail', signedIn, validate({ params: idParams }), async (req, res) => {
    sendJpeg(res, await readPhotoFile(currentUser(req), storage!, pathId(req), 'thumbnail'));
  });
  return router;
}
