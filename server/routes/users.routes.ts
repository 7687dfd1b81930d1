import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requireRole } from '@/server/middleware/auth';
import { getUser, listAudit, listUsers } from '@/server/services/users.service';
import { readPaging } from '@/shared/rules/paging';

export function usersRoutes({ config }: AppContext) {
  const router = Router();
  router.use(['/users', '/audit'], auth(config.jwtSecret));
  router.get('/users', requireRole('admin', 'supervisor'), async (req, res) => {
    res.json(await listUsers(currentUser(req), readPaging(req.query)));
  });
  router.get('/users/:id', requireRole('admin', 'supervisor'), async (req, res) => {
    res.json(await getUser(currentUser(req), Number(req.params.id)));
  });
  router.get('/audit', requireRole('admin'), async (req, res) => {
    res.json(await listAudit(currentUser(req), readPaging(req.query)));
  });
  return router;
}
