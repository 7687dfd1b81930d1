import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { afterResponse } from '@/server/lib/background';
import { accountAndAddressLimits, addressKey, attemptLimiter } from '@/server/middleware/attempt-limits';
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
  // The same allowance as sign-in, so the forms cannot be used to flood an inbox or probe for tokens.
  const resetLimits = accountAndAddressLimits(config, 'reset', { countAll: true });
  const setLimit = attemptLimiter(config, 'set-password', addressKey);
  router.post('/auth/password/reset-request', ...resetLimits, validate({ body: resetRequestSchema }), (req, res) => {
    // Answered before any work is done, so a known address and an unknown one take the same time.
    res.status(202).json(RESET_REQUEST_ANSWER);
    afterResponse('password reset request', () => requestPasswordReset(sequelize, req.body, req.ip ?? null));
  });
  router.post('/auth/password/set', setLimit, validate({ body: setPasswordSchema }), async (req, res) => {
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
