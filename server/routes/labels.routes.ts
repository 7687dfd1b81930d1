import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { checkedQuery, pathId, validate } from '@/server/middleware/validate';
import { getAsset } from '@/server/services/assets.service';
import { assetIdForLabel, labelsPdf, replaceLabel, retiredLabels } from '@/server/services/labels.service';
import { labelsPdfQuery, type LabelsPdfQuery } from '@/shared/schemas/queries';
import { idParams } from '@/shared/schemas/request';

export function labelsRoutes({ config, sequelize }: AppContext) {
  const router = Router();
  const authed = auth(config.jwtSecret);

  router.get('/labels.pdf', authed, validate({ query: labelsPdfQuery }), async (req, res) => {
    const { layout, ...selection } = checkedQuery<LabelsPdfQuery>(req);
    const pdf = await labelsPdf(currentUser(req), selection, layout, config.publicUrl);
    res.type('application/pdf').set('Content-Disposition', `attachment; filename="isoledger-labels-${layout}.pdf"`).send(pdf);
  });
  // The item's record itself, so the client can open it from this answer without asking again.
  router.get('/labels/:code', authed, async (req, res) => {
    const actor = currentUser(req);
    res.json(await getAsset(actor, await assetIdForLabel(actor, String(req.params.code))));
  });
  router.post('/assets/:id/label/replace', authed, requirePermission('replaceLabel'), validate({ params: idParams }), async (req, res) => {
    res.json(await replaceLabel(sequelize, currentUser(req), pathId(req)));
  });
  router.get('/assets/:id/label/retired', authed, validate({ params: idParams }), async (req, res) => {
    const actor = currentUser(req);
    const asset = await getAsset(actor, pathId(req));
    res.json(await retiredLabels(actor, asset.id));
  });
  return router;
}
