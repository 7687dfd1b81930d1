import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { undeliveredMail } from '@/server/mail/outbox';
import { attemptLimiter } from '@/server/middleware/attempt-limits';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { pathId, validate } from '@/server/middleware/validate';
import { changeUser, getUser, inviteUser, listUsers, resendInvite, setSiteAccess } from '@/server/services/users.service';
import { readPaging } from '@/shared/rules/paging';
import { idParams, pagingQuery } from '@/shared/schemas/request';
import { changeUserSchema, inviteUserSchema, siteAccessSchema } from '@/shared/schemas/team';

/**
 * The organisation's people. Reading them takes `listPeople`; the rest is team administration (`administerTeam`),
 * every change written to the audit log (GET /api/audit, audit.routes.ts).
 * GET   /api/users                 ?page&pageSize → ListResponse<TeamMember>
 * GET   /api/users/:id             → TeamMember
 * POST  /api/users/invite          { name, email, role } → 201 TeamMember; e-mails a 7-day one-time link
 * POST  /api/users/:id/invite      → TeamMember; a fresh link for someone who has not yet chosen a password
 * PATCH /api/users/:id             { role?, active? } → TeamMember; deactivation ends their sessions at once
 * PUT   /api/users/:id/sites       { siteIds } → TeamMember; the sites a viewer may see (replaces the list)
 * GET   /api/team/undelivered-mail → { items: UndeliveredMail[], total }; e-mails the mail server refused for good
 */
export function usersRoutes({ sequelize, config }: AppContext) {
  const router = Router();
  const signedIn = auth(config.jwtSecret);
  const admin = requirePermission('administerTeam');
  // Refused invitations count against the admin, so addresses cannot be tried by the thousand.
  const inviteLimit = attemptLimiter(config, 'invite', (req) => `user:${req.user?.id ?? ''}`);
  router.use('/users', signedIn);
  router.get('/users', requirePermission('listPeople'), validate({ query: pagingQuery }), async (req, res) => {
    res.json(await listUsers(currentUser(req), readPaging(req.query)));
  });
  router.get('/users/:id', requirePermission('listPeople'), validate({ params: idParams }), async (req, res) => {
    res.json(await getUser(currentUser(req), pathId(req)));
  });
  router.post('/users/invite', admin, inviteLimit, validate({ body: inviteUserSchema }), async (req, res) => {
    res.status(201).json(await inviteUser(sequelize, currentUser(req), req.body, req.ip ?? null));
  });
  router.post('/users/:id/invite', admin, validate({ params: idParams }), async (req, res) => {
    res.json(await resendInvite(sequelize, currentUser(req), pathId(req), req.ip ?? null));
  });
  router.patch('/users/:id', admin, validate({ params: idParams, body: changeUserSchema }), async (req, res) => {
    res.json(await changeUser(sequelize, currentUser(req), pathId(req), req.body, req.ip ?? null));
  });
  router.put('/users/:id/sites', admin, validate({ params: idParams, body: siteAccessSchema }), async (req, res) => {
    res.json(await setSiteAccess(sequelize, currentUser(req), pathId(req), req.body, req.ip ?? null));
  });
  router.get('/team/undelivered-mail', signedIn, admin, async (req, res) => {
    res.json(await undeliveredMail(sequelize, currentUser(req).organisationId));
  });
  return router;
}
