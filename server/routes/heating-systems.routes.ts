import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { pathId, validate } from '@/server/middleware/validate';
import { getSystem, listSystems, saveSystem, systemExpansionCheck } from '@/server/services/heating-systems.service';
import { heatingSystemSchema, systemParams } from '@/shared/schemas/readings';
import { idParams } from '@/shared/schemas/request';

/** Design values per heating system (site + the `system` text on its items) and the vessel check. */
export function heatingSystemsRoutes({ config }: AppContext) {
  const router = Router();
  const signedIn = auth(config.jwtSecret);
  const systemPath = validate({ params: systemParams });

  router.get('/sites/:id/systems', signedIn, validate({ params: idParams }), async (req, res) => {
    res.json(await listSystems(currentUser(req), pathId(req)));
  });
  router.get('/sites/:id/systems/:name', signedIn, systemPath, async (req, res) => {
    res.json(await getSystem(currentUser(req), pathId(req), String(req.params.name)));
  });
  // Engineers read the valve and unit on site, so they may record the values as well as supervisors.
  router.put('/sites/:id/systems/:name', signedIn, requirePermission('recordReadings'), validate({ params: systemParams, body: heatingSystemSchema }), async (req, res) => {
    res.json(await saveSystem(currentUser(req), pathId(req), String(req.params.name), req.body));
  });
  router.get('/sites/:id/systems/:name/expansion-check', signedIn, systemPath, async (req, res) => {
    res.json(await systemExpansionCheck(currentUser(req), pathId(req), String(req.params.name)));
  });
  return router;
}
