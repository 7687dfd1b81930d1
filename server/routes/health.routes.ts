import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { checkHealth } from '@/server/services/health.service';

export function healthRoutes({ sequelize, launcher }: AppContext) {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const health = await checkHealth(sequelize, launcher);
    if (!health.ok) res.set('Retry-After', '5');
    res.status(health.ok ? 200 : 503).json(health);
  });
  return router;
}
