import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { HttpError } from '@/server/lib/http-error';
import { auth, currentUser } from '@/server/middleware/auth';
import { getAsset } from '@/server/services/assets.service';
import { assetIdForLabel, labelsPdf, replaceLabel, retiredLabels } from '@/server/services/labels.service';

const idList = (raw: unknown): number[] =>
  String(raw ?? '').split(',').map((s) => s.trim()).filter(Boolean).map((s) => {
    const n = Number(s);
    if (!Number.isSafeInteger(n) || n <= 0) throw new HttpError(400, 'bad-id', 'assetIds must be a comma-separated list of numbers.');
    return n;
  });

export function labelsRoutes({ config, sequelize }: AppContext) {
  const router = Router();
  const authed = auth(config.jwtSecret);

  router.get('/labels.pdf', authed, async (req, res) => {
    const q = req.query as Record<string, string | undefined>;
    const layout = q.layout ?? 'sheet';
    if (layout !== 'sheet' && layout !== 'roll') throw new HttpError(400, 'bad-layout', 'layout must be sheet or roll.');
    const pdf = await labelsPdf(
      currentUser(req),
      { assetIds: q.assetIds ? idList(q.assetIds) : undefined, plantRoomId: q.plantRoomId ? Number(q.plantRoomId) : undefined, siteId: q.siteId ? Number(q.siteId) : undefined },
      layout,
      config.publicUrl,
    );
    res.type('application/pdf').set('Content-Disposition', `attachment; filename="isoledger-labels-${layout}.pdf"`).send(pdf);
  });
  router.get('/labels/:code', authed, async (req, res) => {
    const actor = currentUser(req);
    res.json(await getAsset(actor, await assetIdForLabel(actor, String(req.params.code))));
  });
  router.post('/assets/:id/label/replace', authed, async (req, res) => {
    res.json(await replaceLabel(sequelize, currentUser(req), Number(req.params.id)));
  });
  router.get('/assets/:id/label/retired', authed, async (req, res) => {
    const actor = currentUser(req);
    const asset = await getAsset(actor, Number(req.params.id));
    res.json(await retiredLabels(actor, asset.id));
  });
  return router;
}
