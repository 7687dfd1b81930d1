import { Router } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { AppContext } from '@/server/app';
import { auth, currentUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { getMe, signIn, signOut } from '@/server/services/auth.service';
import { signInSchema } from '@/shared/schemas/auth';

export function authRoutes({ config }: AppContext) {
  const router = Router();
  const loginLimiter = rateLimit({
    windowMs: config.loginRateLimit.windowMs,
    limit: config.loginRateLimit.max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // Counted per address and e-mail, so one person's typos do not lock out a whole office behind one address.
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').trim().toLowerCase()}`,
    handler: (_req, res, _next, options) => {
      res.status(options.statusCode).json({
        error: { code: 'rate-limited', message: 'Too many sign-in attempts. Wait a few minutes and try again.' },
      });
    },
  });

  router.post('/auth/login', loginLimiter, validate({ body: signInSchema }), async (req, res) => {
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
