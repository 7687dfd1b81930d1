import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { idParams } from '@/shared/schemas/request';
import { validate } from '@/server/middleware/validate';
import { createProcedureReview, listProcedureReviews } from '@/server/services/procedure-reviews.service';
import { procedureReviewSchema } from '@/shared/schemas/procedure-reviews';

/** A site's periodic reviews of its isolation procedure (OSHA 29 CFR 1910.147(c)(6)). */
export function procedureReviewsRoutes({ config }: AppContext) {
  const router = Router();
  const authed = auth(config.jwtSecret);
  router.get('/sites/:id/procedure-reviews', authed, validate({ params: idParams }), async (req, res) => {
    res.json(await listProcedureReviews(currentUser(req), Number(req.params.id)));
  });
  router.post('/sites/:id/procedure-reviews', authed, requirePermission('reviewProcedures'), validate({ params: idParams, body: procedureReviewSchema }), async (req, res) => {
    res.status(201).json(await createProcedureReview(currentUser(req), Number(req.params.id), req.body));
  });
  return router;
}
