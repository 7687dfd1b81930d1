import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { pathId, validate } from '@/server/middleware/validate';
import { listSitePlantRooms } from '@/server/services/plant-rooms.service';
import { createSite, getSite, listSites, updateSite } from '@/server/services/sites.service';
import { readPaging } from '@/shared/rules/paging';
import { sitePatchSchema, siteSchema } from '@/shared/schemas/register';
import { idParams, pagingQuery } from '@/shared/schemas/request';

export function sitesRoutes({ config }: AppContext) {
  const router = Router();
  // Auth on each route rather than router.use: other routers serve paths under the same prefixes.
  const signedIn = auth(config.jwtSecret);
  router.get('/sites', signedIn, validate({ query: pagingQuery }), async (req, res) => {
    res.json(await listSites(currentUser(req), readPaging(req.query)));
  });
  router.post('/sites', signedIn, requirePermission('manageSites'), validate({ body: siteSchema }), async (req, res) => {
    res.status(201).json(await createSite(currentUser(req), req.body));
  });
  router.get('/sites/:id', signedIn, validate({ params: idParams }), async (req, res) => {
    res.json(await getSite(currentUser(req), pathId(req)));
  });
  router.patch('/sites/:id', signedIn, requirePermission('manageSites'), validate({ params: idParams, body: sitePatchSchema }), async (req, res) => {
    res.json(await updateSite(currentUser(req), pathId(req), req.body));
  });
  router.get('/sites/:id/plant-rooms', signedIn, validate({ params: idParams, query: pagingQuery }), async (req, res) => {
    res.json(await listSitePlantRooms(currentUser(req), pathId(req), readPaging(req.query)));
  });
  return router;
}
