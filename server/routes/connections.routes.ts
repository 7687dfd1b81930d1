import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { pathId, validate } from '@/server/middleware/validate';
import { exportConnectionsCsv, importConnectionsCsv } from '@/server/services/connections-import.service';
import { createConnection, deleteConnection, listAssetConnections } from '@/server/services/connections.service';
import { getClosingAffects, getIsolationPlan, getPlantRoomDiagram } from '@/server/services/isolation-plan.service';
import { requireFile, singleFileUpload } from '@/server/lib/uploads';
import { localDate } from '@/shared/rules/time-zone';
import { connectionSchema, connectionsExportQuery } from '@/shared/schemas/connections';
import { idParams } from '@/shared/schemas/request';

const MAX_IMPORT_BYTES = 2 * 1024 * 1024;

export function connectionsRoutes({ config, sequelize }: AppContext) {
  const router = Router();
  // Auth on each route rather than router.use: other routers serve paths under the same prefixes.
  const signedIn = auth(config.jwtSecret);
  const editors = requirePermission('addToRegister');
  const importers = requirePermission('importRegister');
  const withId = validate({ params: idParams });

  router.get('/connections/export.csv', signedIn, validate({ query: connectionsExportQuery }), async (req, res) => {
    const siteId = (req.query as { siteId?: number }).siteId ?? null;
    res.set('Content-Disposition', `attachment; filename="isoledger-connections-${localDate(new Date(), 'UTC')}.csv"`);
    res.type('text/csv; charset=utf-8').send(await exportConnectionsCsv(currentUser(req), siteId));
  });
  // dryRun unless `dryRun=false` is said outright: a preview never writes.
  router.post('/connections/import', signedIn, importers, singleFileUpload('file', MAX_IMPORT_BYTES, 'CSV file'), async (req, res) => {
    const file = requireFile(req, 'file', 'CSV file');
    res.json(await importConnectionsCsv(currentUser(req), sequelize, file.buffer, req.query.dryRun !== 'false'));
  });
  router.post('/connections', signedIn, editors, validate({ body: connectionSchema }), async (req, res) => {
    res.status(201).json(await createConnection(currentUser(req), req.body));
  });
  router.delete('/connections/:id', signedIn, editors, withId, async (req, res) => {
    await deleteConnection(currentUser(req), pathId(req));
    res.status(204).end();
  });
  router.get('/assets/:id/connections', signedIn, withId, async (req, res) => {
    res.json(await listAssetConnections(currentUser(req), pathId(req)));
  });
  router.get('/assets/:id/isolation-plan', signedIn, withId, async (req, res) => {
    res.json(await getIsolationPlan(currentUser(req), pathId(req), req.query.sources));
  });
  router.get('/assets/:id/closing-affects', signedIn, withId, async (req, res) => {
    res.json(await getClosingAffects(currentUser(req), pathId(req)));
  });
  router.get('/plant-rooms/:id/diagram', signedIn, withId, async (req, res) => {
    res.json(await getPlantRoomDiagram(currentUser(req), pathId(req)));
  });
  return router;
}
