import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { MAX_PHOTO_BYTES } from '@/server/lib/photo-processing';
import { requireFile, singleFileUpload } from '@/server/lib/uploads';
import { auth, currentUser, requireRole } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { exportRegisterCsv, importRegisterCsv } from '@/server/services/asset-import.service';
import { readAssetListFilters } from '@/server/services/asset-search';
import { archiveAsset, createAsset, getAsset, listAssets, updateAsset } from '@/server/services/assets.service';
import { addPhoto } from '@/server/services/photos.service';
import { parseId } from '@/server/services/register-access';
import { readPaging } from '@/shared/rules/paging';
import { localDate } from '@/shared/rules/time-zone';
import { assetPatchSchema } from '@/shared/schemas/register';

const MAX_IMPORT_BYTES = 5 * 1024 * 1024;

export function assetsRoutes({ config, sequelize, storage }: AppContext) {
  const router = Router();
  const editors = requireRole('admin', 'supervisor', 'engineer');
  const supervisory = requireRole('admin', 'supervisor');
  // Auth on each route rather than router.use: other routers serve paths under the same prefixes.
  const signedIn = auth(config.jwtSecret);

  router.get('/assets/export.csv', signedIn, async (req, res) => {
    const { siteId, plantRoomId, type } = readAssetListFilters(req.query);
    const csv = await exportRegisterCsv(currentUser(req), { siteId, plantRoomId, type });
    res.set('Content-Disposition', `attachment; filename="isoledger-register-${localDate(new Date(), 'UTC')}.csv"`);
    res.type('text/csv; charset=utf-8').send(csv);
  });
  // dryRun unless `dryRun=false` is said outright: a preview never writes.
  router.post('/assets/import', signedIn, supervisory, singleFileUpload('file', MAX_IMPORT_BYTES, 'CSV file'), async (req, res) => {
    const file = requireFile(req, 'file', 'CSV file');
    res.json(await importRegisterCsv(currentUser(req), sequelize, file.buffer, req.query.dryRun !== 'false'));
  });
  router.get('/assets', signedIn, async (req, res) => {
    res.json(await listAssets(currentUser(req), readAssetListFilters(req.query), readPaging(req.query)));
  });
  // The body is checked whole in the service (fields and the type's attributes together, all errors at once).
  router.post('/assets', signedIn, editors, async (req, res) => {
    res.status(201).json(await createAsset(currentUser(req), req.body ?? {}));
  });
  router.get('/assets/:id', signedIn, async (req, res) => {
    res.json(await getAsset(currentUser(req), parseId(req.params.id)));
  });
  router.patch('/assets/:id', signedIn, editors, validate(assetPatchSchema), async (req, res) => {
    res.json(await updateAsset(currentUser(req), parseId(req.params.id), req.body));
  });
  router.post('/assets/:id/archive', signedIn, supervisory, async (req, res) => {
    res.json(await archiveAsset(currentUser(req), parseId(req.params.id)));
  });
  router.post('/assets/:id/photos', signedIn, editors, singleFileUpload('photo', MAX_PHOTO_BYTES, 'photo'), async (req, res) => {
    const file = requireFile(req, 'photo', 'photo');
    res.status(201).json(await addPhoto(currentUser(req), storage!, { assetId: parseId(req.params.id) }, file, req.body?.caption));
  });
  return router;
}
