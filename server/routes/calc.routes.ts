import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { expansionVesselCheck } from '@/server/services/calc.service';
import { expansionVesselRequestSchema, type ExpansionVesselRequest } from '@/shared/schemas/readings';

/** Calculators that need no stored data; any signed-in role may use them. */
export function calcRoutes({ config }: AppContext) {
  const router = Router();
  router.use('/calc', auth(config.jwtSecret));
  router.post('/calc/expansion-vessel', validate({ body: expansionVesselRequestSchema }), (req, res) => {
    res.json(expansionVesselCheck(req.body as ExpansionVesselRequest));
  });
  return router;
}
