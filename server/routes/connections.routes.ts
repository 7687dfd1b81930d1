import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requireRole } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { exportConnectionsCsv, importConnectionsCsv } from '@/server/services/connections-import.service';
import { createConnection, deleteConnection, listAssetConnections } from '@/server/services/connections.service';
import { getClosingAffects, getIsolationPlan, getPlantRoomDiagram } from '@/server/services/isolation-plan.service';
import { parseId } from '@/server/services/register-access';
import { requireFile, singleFileUpload } from '@/server/lib/uploads';
import { localDate } from '@/shared/rules/time-zone';
import { connectionSchema } from '@/shared/schemas/connections';

const MAX_IMPORT_BYTES = 2 * 1024 * 1024;

export function connectionsRoutes({ config, sequelize }: AppContext) {
  const router = Router();
  // Auth on each route rather than router.use: other routers serve paths under the same prefixes.
  const signedIn = auth(config.jwtSecret);
  const editors = requireRole('admin', 'supervisor', 'engineer');
  const supervisory = requireRole('admin', 'supervisor');

  router.get('/connections/export.csv', signedIn, async (req, res) => {
    const siteId = req.query.siteId ? parseId(req.query.siteId) : null;
    res.set('Content-Disposition', `attachment; filename="isoledger-connections-${localDate(new Date(), 'UTC')}.csv"`);
    res.type('text/csv; charset=utf-8').send(await exportConnectionsCsv(currentUser(req), siteId));
  });
  // dryRun unless `dryRun=false` is said outright: a preview never writes.
  router.post('/connections/import', signedIn, supervisory, singleFileUpload('file', MAX_IMPORT_BYTES, 'CSV file'), async (req, res) => {
    const file = requireFile(req, 'file', 'CSV file');
    res.json(await importConnectionsCsv(currentUser(req), sequelize, file.buffer, req.query.dryRun !== 'false'));
  });
  router.post('/connections', signedIn, editors, validate(connectionSchema), async (req, res) => {
    res.status(201).json(await createConnection(currentUser(req), req.body));
  });
  router.delete('/connections/:id', signedIn, editors, async (req, res) => {
    await deleteConnection(currentUser(req), parseId(req.params.id));
    res.status(204).end();
  });
  router.get('/assets/:id/connections', signedIn, async (req, res) => {
    res.json(await listAssetConnections(currentUser(req), parseId(req.params.id)));
  });
  router.get('/assets/:id/isolation-plan', signedIn, async (req, res) => {
    res.json(await getIsolationPlan(currentUser(req), parseId(req.params.id), req.query.sources));
  });
  router.get('/assets/:id/closing-affects', signedIn, async (req, res) => {
    res.json(await getClosingAffects(currentUser(req), parseId(req.params.id)));
  });
  router.get('/plant-rooms/:id/diagram', signedIn, async (req, res) => {
    res.json(await getPlantRoomDiagram(currentUser(req), parseId(req.params.id)));
  });
  return router;
}
