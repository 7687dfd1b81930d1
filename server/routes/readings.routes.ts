import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requireRole } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { parseId } from '@/server/services/register-access';
import { latestSiteFlags } from '@/server/services/reading-flags.service';
import { correctReading, listReadings, logReadings } from '@/server/services/readings.service';
import { readPaging } from '@/shared/rules/paging';
import { readingCorrectionSchema, readingSetSchema } from '@/shared/schemas/readings';

export function readingsRoutes({ config }: AppContext) {
  const router = Router();
  const authed = auth(config.jwtSecret);
  const recorders = requireRole('admin', 'supervisor', 'engineer');

  router.get('/assets/:id/readings', authed, async (req, res) => {
    res.json(await listReadings(currentUser(req), parseId(req.params.id), readPaging(req.query)));
  });
  router.post('/assets/:id/readings', authed, recorders, validate(readingSetSchema), async (req, res) => {
    res.status(201).json(await logReadings(currentUser(req), parseId(req.params.id), req.body));
  });
  // Author only (checked in the service): a correction is a new set that supersedes the original.
  router.post('/readings/:id/correct', authed, recorders, validate(readingCorrectionSchema), async (req, res) => {
    res.status(201).json(await correctReading(currentUser(req), parseId(req.params.id), req.body));
  });
  // Per item on the site, the flags of its latest current set: what needs attention on this visit.
  router.get('/sites/:id/reading-flags', authed, async (req, res) => {
    res.json({ items: await latestSiteFlags(currentUser(req), parseId(req.params.id)) });
  });
  return router;
}
