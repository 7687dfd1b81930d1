import { Router } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { AppContext } from '@/server/app';
import { auth, currentUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { RESET_REQUEST_ANSWER, requestPasswordReset, setPasswordWithToken } from '@/server/services/password.service';
import { getMySettings, updateMySettings } from '@/server/services/settings.service';
import { mySettingsSchema, resetRequestSchema, setPasswordSchema } from '@/shared/schemas/team';

/**
 * POST  /api/auth/password/reset-request  { email } → 202 ResetRequestResponse, the same for any address
 * POST  /api/auth/password/set            { token, password } → 200 { email }; 400 link-invalid if expired or used
 * GET   /api/me/settings                  → MySettings
 * PATCH /api/me/settings                  { contactPhone?, notifications? } → MySettings
 */
export function accountRoutes({ sequelize, config }: AppContext) {
  const router = Router();
  // The same allowance as sign-in, so the form cannot be used to flood an inbox or probe for tokens.
  const limiter = rateLimit({
    windowMs: config.loginRateLimit.windowMs,
    limit: config.loginRateLimit.max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${req.path}`,
    handler: (_req, res, _next, options) => {
      res.status(options.statusCode).json({ error: { code: 'rate-limited', message: 'Too many attempts. Wait a few minutes and try again.' } });
    },
  });
  router.post('/auth/password/reset-request', limiter, validate({ body: resetRequestSchema }), async (req, res) => {
    await requestPasswordReset(sequelize, req.body, req.ip ?? null);
    res.status(202).json(RESET_REQUEST_ANSWER);
  });
  router.post('/auth/password/set', limiter, validate({ body: setPasswordSchema }), async (req, res) => {
    res.json(await setPasswordWithToken(sequelize, config, req.body, req.ip ?? null));
  });
  router.get('/me/settings', auth(config.jwtSecret), async (req, res) => {
    res.json(await getMySettings(currentUser(req)));
  });
  router.patch('/me/settings', auth(config.jwtSecret), validate({ body: mySettingsSchema }), async (req, res) => {
    res.json(await updateMySettings(sequelize, currentUser(req), req.body));
  });
  return router;
}
