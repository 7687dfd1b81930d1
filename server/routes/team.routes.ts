import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { attemptLimiter } from '@/server/middleware/attempt-limits';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { pathId, validate } from '@/server/middleware/validate';
import { undeliveredMail } from '@/server/mail/outbox';
import { changeUser, inviteUser, resendInvite, setSiteAccess } from '@/server/services/team.service';
import { idParams } from '@/shared/schemas/request';
import { changeUserSchema, inviteUserSchema, siteAccessSchema } from '@/shared/schemas/team';

/**
 * Team administration, admins only; every change is written to the audit log (GET /api/audit).
 * POST  /api/users/invite       { name, email, role } → 201 TeamMember; e-mails a 7-day one-time link
 * POST  /api/users/:id/invite   → TeamMember; a fresh link for someone who has not yet chosen a password
 * PATCH /api/users/:id          { role?, active? } → TeamMember; deactivation ends their sessions at once
 * PUT   /api/users/:id/sites    { siteIds } → TeamMember; the sites a viewer may see (replaces the list)
 * GET   /api/team/undelivered-mail → { items: UndeliveredMail[], total }; e-mails the mail server refused for good
 */
export function teamRoutes({ sequelize, config }: AppContext) {
  const router = Router();
  const admin = [auth(config.jwtSecret), requirePermission('administerTeam')];
  // Refused invitations count against the admin, so addresses cannot be tried by the thousand.
  const inviteLimit = attemptLimiter(config, 'invite', (req) => `user:${req.user?.id ?? ''}`);
  router.post('/users/invite', ...admin, inviteLimit, validate({ body: inviteUserSchema }), async (req, res) => {
    res.status(201).json(await inviteUser(sequelize, currentUser(req), req.body, req.ip ?? null));
  });
  router.post('/users/:id/invite', ...admin, validate({ params: idParams }), async (req, res) => {
    res.json(await resendInvite(sequelize, currentUser(req), pathId(req), req.ip ?? null));
  });
  router.patch('/users/:id', ...admin, validate({ params: idParams, body: changeUserSchema }), async (req, res) => {
    res.json(await changeUser(sequelize, currentUser(req), pathId(req), req.body, req.ip ?? null));
  });
  router.put('/users/:id/sites', ...admin, validate({ params: idParams, body: siteAccessSchema }), async (req, res) => {
    res.json(await setSiteAccess(sequelize, currentUser(req), pathId(req), req.body, req.ip ?? null));
  });
  router.get('/team/undelivered-mail', ...admin, async (req, res) => {
    res.json(await undeliveredMail(sequelize, currentUser(req).organisationId));
  });
  return router;
}
