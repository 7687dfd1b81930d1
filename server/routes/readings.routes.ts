import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { parseId, validate } from '@/server/middleware/validate';
import { correctReading, listReadings, logReadings } from '@/server/services/readings.service';
import { readPaging } from '@/shared/rules/paging';
import { readingCorrectionSchema, readingSetSchema } from '@/shared/schemas/readings';
import { idParams, pagingQuery } from '@/shared/schemas/request';

export function readingsRoutes({ config }: AppContext) {
  const router = Router();
  const authed = auth(config.jwtSecret);
  const recorders = requirePermission('recordReadings');

  router.get('/assets/:id/readings', authed, validate({ params: idParams, query: pagingQuery }), async (req, res) => {
    res.json(await listReadings(currentUser(req), parseId(req.params.id), readPaging(req.query)));
  });
  router.post('/assets/:id/readings', authed, recorders, validate(readingSetSchema), async (req, res) => {
    const key = req.get('idempotency-key')?.slice(0, 100) || null;
    res.status(201).json(await logReadings(currentUser(req), parseId(req.params.id), req.body, key));
  });
  // Author only (checked in the service): a correction is a new set that supersedes the original.
  router.post('/readings/:id/correct', authed, recorders, validate(readingCorrectionSchema), async (req, res) => {
    res.status(201).json(await correctReading(currentUser(req), parseId(req.params.id), req.body));
  });
  return router;
}
