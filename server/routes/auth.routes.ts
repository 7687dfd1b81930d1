import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { afterResponse } from '@/server/lib/background';
import { accountAndAddressLimits, addressKey, attemptLimiter } from '@/server/middleware/attempt-limits';
import { auth, currentUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { RESET_REQUEST_ANSWER, requestPasswordReset, setPasswordWithToken, signIn, signOut } from '@/server/services/auth.service';
import { signInSchema } from '@/shared/schemas/auth';
import { resetRequestSchema, setPasswordSchema } from '@/shared/schemas/team';

/**
 * POST  /api/auth/login                   { email, password } → SignInResponse; 401 invalid-credentials
 * POST  /api/auth/logout                  → 204; every session of the user ends
 * POST  /api/auth/password/reset-request  { email } → 202 ResetRequestResponse, the same for any address
 * POST  /api/auth/password/set            { token, password } → 200 { email }; 400 link-invalid if expired or used
 */
export function authRoutes({ sequelize, config }: AppContext) {
  const router = Router();
  const loginLimits = accountAndAddressLimits(config, 'sign-in', { message: 'Too many sign-in attempts. Wait a few minutes and try again.' });
  // The same allowance as sign-in, so the forms cannot be used to flood an inbox or probe for tokens.
  const resetLimits = accountAndAddressLimits(config, 'reset', { countAll: true });
  const setLimit = attemptLimiter(config, 'set-password', addressKey);

  router.post('/auth/login', ...loginLimits, validate({ body: signInSchema }), async (req, res) => {
    res.json(await signIn(req.body, config, req.ip ?? null));
  });
  router.post('/auth/logout', auth(config.jwtSecret), async (req, res) => {
    await signOut(currentUser(req).id, req.ip ?? null);
    res.status(204).end();
  });
  router.post('/auth/password/reset-request', ...resetLimits, validate({ body: resetRequestSchema }), (req, res) => {
    // Answered before any work is done, so a known address and an unknown one take the same time.
    res.status(202).json(RESET_REQUEST_ANSWER);
    afterResponse('password reset request', () => requestPasswordReset(sequelize, req.body, req.ip ?? null));
  });
  router.post('/auth/password/set', setLimit, validate({ body: setPasswordSchema }), async (req, res) => {
    res.json(await setPasswordWithToken(sequelize, config, req.body, req.ip ?? null));
  });
  return router;
}
