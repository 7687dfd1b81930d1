import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { MAX_PHOTO_BYTES } from '@/server/lib/photo-processing';
import { requireFile, singleFileUpload } from '@/server/lib/uploads';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { pathId, validate } from '@/server/middleware/validate';
import { addPhoto } from '@/server/services/photos.service';
import { createPlantRoom, openPlantRoom, updatePlantRoom } from '@/server/services/plant-rooms.service';
import { plantRoomPatchSchema, plantRoomSchema } from '@/shared/schemas/register';
import { idParams } from '@/shared/schemas/request';

export function plantRoomsRoutes({ config, storage }: AppContext) {
  const router = Router();
  const editors = requirePermission('addToRegister');
  // Auth on each route rather than router.use: other routers serve paths under the same prefixes.
  const signedIn = auth(config.jwtSecret);
  router.post('/plant-rooms', signedIn, editors, validate({ body: plantRoomSchema }), async (req, res) => {
    res.status(201).json(await createPlantRoom(currentUser(req), req.body));
  });
  router.get('/plant-rooms/:id', signedIn, validate({ params: idParams }), async (req, res) => {
    res.json(await openPlantRoom(currentUser(req), pathId(req)));
  });
  router.patch('/plant-rooms/:id', signedIn, editors, validate({ params: idParams, body: plantRoomPatchSchema }), async (req, res) => {
    res.json(await updatePlantRoom(currentUser(req), pathId(req), req.body));
  });
  router.post('/plant-rooms/:id/photos', signedIn, editors, validate({ params: idParams }), singleFileUpload('photo', MAX_PHOTO_BYTES, 'photo'), async (req, res) => {
    const file = requireFile(req, 'photo', 'photo');
    res.status(201).json(await addPhoto(currentUser(req), storage!, { plantRoomId: pathId(req) }, file, req.body?.caption, req.get('idempotency-key')?.trim().slice(0, 100) || null));
  });
  return router;
}
