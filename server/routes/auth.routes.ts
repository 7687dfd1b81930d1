import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { accountAndAddressLimits } from '@/server/middleware/attempt-limits';
import { auth, currentUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { getMe, signIn, signOut } from '@/server/services/auth.service';
import { signInSchema } from '@/shared/schemas/auth';

export function authRoutes({ config }: AppContext) {
  const router = Router();
  const loginLimits = accountAndAddressLimits(config, 'sign-in', { message: 'Too many sign-in attempts. Wait a few minutes and try again.' });

  router.post('/auth/login', ...loginLimits, validate({ body: signInSchema }), async (req, res) => {
    res.json(await signIn(req.body, config, req.ip ?? null));
  });
  router.post('/auth/logout', auth(config.jwtSecret), async (req, res) => {
    await signOut(currentUser(req).id, req.ip ?? null);
    res.status(204).end();
  });
  router.get('/me', auth(config.jwtSecret), async (req, res) => {
    res.json(await getMe(currentUser(req).id));
  });
  return router;
}
