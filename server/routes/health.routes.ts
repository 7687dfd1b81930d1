import { Router } from 'express';
import type { AppContext } from '@/server/app';

export function healthRoutes({ sequelize }: AppContext) {
  const router = Router();
  router.get('/health', async (_req, res) => {
    let timer: ReturnType<typeof setTimeout> | undefined;
    try {
      await Promise.race([
        sequelize.query('SELECT 1'),
        new Promise((_, reject) => { timer = setTimeout(() => reject(new Error('database check timed out')), 3000); }),
      ]);
      res.json({ ok: true, db: 'up' });
    } catch {
      res.status(503).json({ ok: false, db: 'down' });
    } finally {
      clearTimeout(timer);
    }
  });
  return router;
}
