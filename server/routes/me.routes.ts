import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser } from '@/server/middleware/auth';
import { liveTagsIn } from '@/server/services/live-tags.service';
import { recentPlaces } from '@/server/services/recent-places.service';
import { currentVisit } from '@/server/services/visits.service';

/** The signed-in person's own things: the tags they hold, their visit in progress, the places they opened. */
export function meRoutes({ config }: AppContext) {
  const router = Router();
  const signedIn = auth(config.jwtSecret);
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
