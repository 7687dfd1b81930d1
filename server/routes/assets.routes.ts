import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { MAX_PHOTO_BYTES } from '@/server/lib/photo-processing';
import { requireFile, singleFileUpload } from '@/server/lib/uploads';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { checkedQuery, pathId, validate } from '@/server/middleware/validate';
import { exportRegisterCsv, importRegisterCsv } from '@/server/services/asset-import.service';
import { archiveAsset, createAsset, getAsset, listAssets, updateAsset } from '@/server/services/assets.service';
import { addPhoto } from '@/server/services/photos.service';
import { readPaging } from '@/shared/rules/paging';
import { localDate } from '@/shared/rules/time-zone';
import { assetListQuery, importQuery, type AssetListQuery } from '@/shared/schemas/queries';
import { assetPatchSchema } from '@/shared/schemas/register';
import { idParams } from '@/shared/schemas/request';

const MAX_IMPORT_BYTES = 5 * 1024 * 1024;

export function assetsRoutes({ config, sequelize, storage }: AppContext) {
  const router = Router();
  // Auth on each route rather than router.use: other routers serve paths under the same prefixes.
  const signedIn = auth(config.jwtSecret);

  router.get('/assets/export.csv', signedIn, validate({ query: assetListQuery }), async (req, res) => {
    const { siteId, plantRoomId, type } = checkedQuery<AssetListQuery>(req);
    const csv = await exportRegisterCsv(currentUser(req), { siteId, plantRoomId, type });
    res.set('Content-Disposition', `attachment; filename="isoledger-register-${localDate(new Date(), 'UTC')}.csv"`);
    res.type('text/csv; charset=utf-8').send(csv);
  });
  router.post('/assets/import', signedIn, requirePermission('importRegister'), validate({ query: importQuery }), singleFileUpload('file', MAX_IMPORT_BYTES, 'CSV file'), async (req, res) => {
    const file = requireFile(req, 'file', 'CSV file');
    res.json(await importRegisterCsv(currentUser(req), sequelize, file.buffer, checkedQuery<{ dryRun: boolean }>(req).dryRun));
  });
  router.get('/assets', signedIn, validate({ query: assetListQuery }), async (req, res) => {
    res.json(await listAssets(currentUser(req), checkedQuery<AssetListQuery>(req), readPaging(req.query)));
  });
  // The body is checked whole in the service (fields and the type's attributes together, all errors at once).
  router.post('/assets', signedIn, requirePermission('addToRegister'), async (req, res) => {
    res.status(201).json(await createAsset(currentUser(req), req.body ?? {}));
  });
  router.get('/assets/:id', signedIn, validate({ params: idParams }), async (req, res) => {
    res.json(await getAsset(currentUser(req), pathId(req)));
  });
  router.patch('/assets/:id', signedIn, requirePermission('addToRegister'), validate({ params: idParams, body: assetPatchSchema }), async (req, res) => {
    res.json(await updateAsset(currentUser(req), pathId(req), req.body));
  });
  router.post('/assets/:id/archive', signedIn, requirePermission('archiveRecords'), validate({ params: idParams }), async (req, res) => {
    res.json(await archiveAsset(currentUser(req), pathId(req)));
  });
  router.post('/assets/:id/photos', signedIn, requirePermission('addToRegister'), validate({ params: idParams }), singleFileUpload('photo', MAX_PHOTO_BYTES, 'photo'), async (req, res) => {
    const file = requireFile(req, 'photo', 'photo');
    res.status(201).json(await addPhoto(currentUser(req), storage!, { assetId: pathId(req) }, file, req.body?.caption, req.get('idempotency-key')?.trim().slice(0, 100) || null));
  });
  return router;
}
