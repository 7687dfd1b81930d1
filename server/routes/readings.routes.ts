import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { pathId, validate } from '@/server/middleware/validate';
import { latestSiteFlags } from '@/server/services/reading-flags.service';
import { correctReading, listReadings, logReadings } from '@/server/services/readings.service';
import { readPaging } from '@/shared/rules/paging';
import { readingCorrectionSchema, readingSetSchema } from '@/shared/schemas/readings';
import { idParams, pagingQuery } from '@/shared/schemas/request';

export function readingsRoutes({ config }: AppContext) {
  const router = Router();
  const signedIn = auth(config.jwtSecret);
  const recorders = requirePermission('recordReadings');

  router.get('/assets/:id/readings', signedIn, validate({ params: idParams, query: pagingQuery }), async (req, res) => {
    res.json(await listReadings(currentUser(req), pathId(req), readPaging(req.query)));
  });
  router.post('/assets/:id/readings', signedIn, recorders, validate({ params: idParams, body: readingSetSchema }), async (req, res) => {
    const key = req.get('idempotency-key')?.slice(0, 100) || null;
    res.status(201).json(await logReadings(currentUser(req), pathId(req), req.body, key));
  });
  // Author only (checked in the service): a correction is a new set that supersedes the original.
  router.post('/readings/:id/correct', signedIn, recorders, validate({ params: idParams, body: readingCorrectionSchema }), async (req, res) => {
    res.status(201).json(await correctReading(currentUser(req), pathId(req), req.body));
  });
  // Per item on the site, the flags of its latest current set: what needs attention on this visit.
  router.get('/sites/:id/reading-flags', signedIn, validate({ params: idParams }), async (req, res) => {
    res.json({ items: await latestSiteFlags(currentUser(req), pathId(req)) });
  });
  return router;
}
