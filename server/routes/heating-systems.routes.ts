import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { parseId, validate } from '@/server/middleware/validate';
import { getSystem, listSystems, parseSystemName, saveSystem, systemExpansionCheck } from '@/server/services/heating-systems.service';
import { heatingSystemSchema } from '@/shared/schemas/readings';

/** Design values per heating system (site + the `system` text on its items) and the vessel check. */
export function heatingSystemsRoutes({ config }: AppContext) {
  const router = Router();
  const authed = auth(config.jwtSecret);

  router.get('/sites/:id/systems', authed, async (req, res) => {
    res.json(await listSystems(currentUser(req), parseId(req.params.id)));
  });
  router.get('/sites/:id/systems/:name', authed, async (req, res) => {
    res.json(await getSystem(currentUser(req), parseId(req.params.id), parseSystemName(req.params.name)));
  });
  // Engineers read the valve and unit on site, so they may record the values as well as supervisors.
  router.put('/sites/:id/systems/:name', authed, requirePermission('recordReadings'), validate(heatingSystemSchema), async (req, res) => {
    res.json(await saveSystem(currentUser(req), parseId(req.params.id), parseSystemName(req.params.name), req.body));
  });
  router.get('/sites/:id/systems/:name/expansion-check', authed, async (req, res) => {
    res.json(await systemExpansionCheck(currentUser(req), parseId(req.params.id), parseSystemName(req.params.name)));
  });
  return router;
}
