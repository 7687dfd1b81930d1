import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { MAX_PHOTO_BYTES } from '@/server/lib/photo-processing';
import { requireFile, singleFileUpload } from '@/server/lib/uploads';
import { auth, currentUser, requireRole } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { addPhoto } from '@/server/services/photos.service';
import { createPlantRoom, openPlantRoom, updatePlantRoom } from '@/server/services/plant-rooms.service';
import { parseId } from '@/server/services/register-access';
import { plantRoomPatchSchema, plantRoomSchema } from '@/shared/schemas/register';

export function plantRoomsRoutes({ config, storage }: AppContext) {
  const router = Router();
  const editors = requireRole('admin', 'supervisor', 'engineer');
  // Auth on each route rather than router.use: other routers serve paths under the same prefixes.
  const signedIn = auth(config.jwtSecret);
  router.post('/plant-rooms', signedIn, editors, validate(plantRoomSchema), async (req, res) => {
    res.status(201).json(await createPlantRoom(currentUser(req), req.body));
  });
  router.get('/plant-rooms/:id', signedIn, async (req, res) => {
    res.json(await openPlantRoom(currentUser(req), parseId(req.params.id)));
  });
  router.patch('/plant-rooms/:id', signedIn, editors, validate(plantRoomPatchSchema), async (req, res) => {
    res.json(await updatePlantRoom(currentUser(req), parseId(req.params.id), req.body));
  });
  router.post('/plant-rooms/:id/photos', signedIn, editors, singleFileUpload('photo', MAX_PHOTO_BYTES, 'photo'), async (req, res) => {
    const file = requireFile(req, 'photo', 'photo');
    res.status(201).json(await addPhoto(currentUser(req), storage!, { plantRoomId: parseId(req.params.id) }, file, req.body?.caption));
  });
  return router;
}
