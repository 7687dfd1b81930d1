import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { liveTagsIn } from '@/server/services/live-tags.service';
import { getMe, getMySettings, updateMySettings } from '@/server/services/me.service';
import { recentPlaces } from '@/server/services/recent-places.service';
import { currentVisit } from '@/server/services/visits.service';
import { mySettingsSchema } from '@/shared/schemas/team';

/**
 * The signed-in person's own things; any signed-in role.
 * GET   /api/me                → User (with the organisation)
 * GET   /api/me/settings       → MySettings
 * PATCH /api/me/settings       { contactPhone?, notifications? } → MySettings
 * GET   /api/me/tags           → { items: Tag[] }, the live tags they hold
 * GET   /api/me/visit          → { visit }, their visit in progress or null
 * GET   /api/me/recent-places  → { items }, the places they opened lately
 */
export function meRoutes({ sequelize, config }: AppContext) {
  const router = Router();
  const signedIn = auth(config.jwtSecret);
  router.get('/me', signedIn, async (req, res) => {
    res.json(await getMe(currentUser(req).id));
  });
  router.get('/me/settings', signedIn, async (req, res) => {
    res.json(await getMySettings(currentUser(req)));
  });
  router.patch('/me/settings', signedIn, validate({ body: mySettingsSchema }), async (req, res) => {
    res.json(await updateMySettings(sequelize, currentUser(req), req.body));
  });
  router.get('/me/tags', signedIn, async (req, res) => {
    const actor = currentUser(req);
    res.json({ items: await liveTagsIn(actor, { holderId: actor.id }) });
  });
  router.get('/me/visit', signedIn, async (req, res) => {
    res.json({ visit: await currentVisit(currentUser(req)) });
  });
  router.get('/me/recent-places', signedIn, async (req, res) => {
    res.json({ items: await recentPlaces(currentUser(req)) });
  });
  return router;
}
