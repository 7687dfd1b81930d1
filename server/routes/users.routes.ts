import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { pathId, validate } from '@/server/middleware/validate';
import { getUser, listAudit, listUsers } from '@/server/services/users.service';
import { readPaging } from '@/shared/rules/paging';
import { idParams, pagingQuery } from '@/shared/schemas/request';

export function usersRoutes({ config }: AppContext) {
  const router = Router();
  router.use(['/users', '/audit'], auth(config.jwtSecret));
  router.get('/users', requirePermission('listPeople'), validate({ query: pagingQuery }), async (req, res) => {
    res.json(await listUsers(currentUser(req), readPaging(req.query)));
  });
  router.get('/users/:id', requirePermission('listPeople'), validate({ params: idParams }), async (req, res) => {
    res.json(await getUser(currentUser(req), pathId(req)));
  });
  router.get('/audit', requirePermission('viewAudit'), validate({ query: pagingQuery }), async (req, res) => {
    res.json(await listAudit(currentUser(req), readPaging(req.query)));
  });
  return router;
}
