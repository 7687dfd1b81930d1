import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requireRole } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { listSitePlantRooms } from '@/server/services/plant-rooms.service';
import { parseId } from '@/server/services/register-access';
import { createSite, getSite, listSites, updateSite } from '@/server/services/sites.service';
import { readPaging } from '@/shared/rules/paging';
import { sitePatchSchema, siteSchema } from '@/shared/schemas/register';

export function sitesRoutes({ config }: AppContext) {
  const router = Router();
  // Auth on each route rather than router.use: other routers serve paths under the same prefixes.
  const signedIn = auth(config.jwtSecret);
  router.get('/sites', signedIn, async (req, res) => {
    res.json(await listSites(currentUser(req), readPaging(req.query)));
  });
  router.post('/sites', signedIn, requireRole('admin', 'supervisor'), validate(siteSchema), async (req, res) => {
    res.status(201).json(await createSite(currentUser(req), req.body));
  });
  router.get('/sites/:id', signedIn, async (req, res) => {
    res.json(await getSite(currentUser(req), parseId(req.params.id)));
  });
  router.patch('/sites/:id', signedIn, requireRole('admin', 'supervisor'), validate(sitePatchSchema), async (req, res) => {
    res.json(await updateSite(currentUser(req), parseId(req.params.id), req.body));
  });
  router.get('/sites/:id/plant-rooms', signedIn, async (req, res) => {
    res.json(await listSitePlantRooms(currentUser(req), parseId(req.params.id), readPaging(req.query)));
  });
  return router;
}
