import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { listAudit } from '@/server/services/audit.service';
import { readPaging } from '@/shared/rules/paging';
import { pagingQuery } from '@/shared/schemas/request';

/** GET /api/audit ?page&pageSize → ListResponse<AuditEntry>, newest first (`viewAudit`). */
export function auditRoutes({ config }: AppContext) {
  const router = Router();
  router.use('/audit', auth(config.jwtSecret));
  router.get('/audit', requirePermission('viewAudit'), validate({ query: pagingQuery }), async (req, res) => {
    res.json(await listAudit(currentUser(req), readPaging(req.query)));
  });
  return router;
}
