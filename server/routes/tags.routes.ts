import { Router, type Request } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { checkedQuery, pathId, validate } from '@/server/middleware/validate';
import { addTagNote, addTagPhoto, clearInAbsence, clearTag, extendTag, proveTag } from '@/server/services/tag-actions.service';
import { acceptHandover, offerHandover, reassignInAbsence, withdrawHandover } from '@/server/services/tag-handover.service';
import { idempotencyFor } from '@/server/services/tag-history.service';
import { acknowledgeNotices, pendingNotices } from '@/server/services/tag-notices.service';
import { raiseTag } from '@/server/services/tag-raise.service';
import { getTag, listTagColleagues, listTags } from '@/server/services/tags.service';
import { MAX_PHOTO_BYTES } from '@/server/lib/photo-processing';
import { requireFile, singleFileUpload } from '@/server/lib/uploads';
import { readPaging } from '@/shared/rules/paging';
import { tagListQuery, type TagListQuery } from '@/shared/schemas/queries';
import { idParams } from '@/shared/schemas/request';
import {
  clearInAbsenceSchema, clearTagSchema, extendTagSchema, handoverAcceptSchema, handoverOfferSchema, proofSchema, raiseTagSchema,
  reassignInAbsenceSchema, tagNoteSchema,
} from '@/shared/schemas/tags';

/** Every tag action takes an optional `Idempotency-Key` header: a retry with the same key and body writes nothing new. */
const keyOf = (req: Request, action: string, target: number, body: unknown = req.body) => idempotencyFor(req.get('idempotency-key'), action, target, body);

export function tagsRoutes({ config, sequelize, storage }: AppContext) {
  const router = Router();
  const authed = auth(config.jwtSecret);

  router.post('/assets/:id/tags', authed, requirePermission('raiseTag'), validate({ params: idParams, body: raiseTagSchema }), async (req, res) => {
    const assetId = pathId(req);
    const { tag, created } = await raiseTag(sequelize, currentUser(req), assetId, req.body, keyOf(req, 'raise', assetId));
    res.status(created ? 201 : 200).json(tag);
  });
  router.get('/tags', authed, validate({ query: tagListQuery }), async (req, res) => {
    res.json(await listTags(currentUser(req), checkedQuery<TagListQuery>(req), readPaging(req.query)));
  });
  /** The caller's notices of tags cleared or reassigned in their absence, not yet acknowledged. */
  router.get('/tag-notices', authed, async (req, res) => {
    res.json(await pendingNotices(currentUser(req)));
  });
  /** Colleagues a tag can be offered or reassigned to. */
  router.get('/tag-colleagues', authed, async (req, res) => {
    res.json(await listTagColleagues(currentUser(req)));
  });
  router.get('/tags/:id', authed, validate({ params: idParams }), async (req, res) => {
    res.json(await getTag(currentUser(req), pathId(req)));
  });
  router.post('/tags/:id/clear', authed, validate({ params: idParams, body: clearTagSchema }), async (req, res) => {
    res.json(await clearTag(sequelize, currentUser(req), pathId(req), req.body, keyOf(req, 'clear', pathId(req))));
  });
  router.post('/tags/:id/clear-in-absence', authed, validate({ params: idParams, body: clearInAbsenceSchema }), async (req, res) => {
    res.json(await clearInAbsence(sequelize, currentUser(req), pathId(req), req.body, keyOf(req, 'clear-in-absence', pathId(req))));
  });
  router.post('/tags/:id/reassign-in-absence', authed, requirePermission('superviseTags'), validate({ params: idParams, body: reassignInAbsenceSchema }), async (req, res) => {
    res.json(await reassignInAbsence(sequelize, currentUser(req), pathId(req), req.body, keyOf(req, 'reassign-in-absence', pathId(req))));
  });
  router.post('/tags/:id/extend', authed, validate({ params: idParams, body: extendTagSchema }), async (req, res) => {
    res.json(await extendTag(sequelize, currentUser(req), pathId(req), req.body, keyOf(req, 'extend', pathId(req))));
  });
  router.post('/tags/:id/prove', authed, validate({ params: idParams, body: proofSchema }), async (req, res) => {
    res.status(201).json(await proveTag(sequelize, currentUser(req), pathId(req), req.body, keyOf(req, 'prove', pathId(req))));
  });
  router.post('/tags/:id/handover', authed, validate({ params: idParams, body: handoverOfferSchema }), async (req, res) => {
    res.json(await offerHandover(sequelize, currentUser(req), pathId(req), req.body, keyOf(req, 'handover-offer', pathId(req))));
  });
  router.post('/tags/:id/handover/accept', authed, validate({ params: idParams, body: handoverAcceptSchema }), async (req, res) => {
    res.json(await acceptHandover(sequelize, currentUser(req), pathId(req), req.body, keyOf(req, 'handover-accept', pathId(req))));
  });
  router.post('/tags/:id/handover/withdraw', authed, validate({ params: idParams }), async (req, res) => {
    res.json(await withdrawHandover(sequelize, currentUser(req), pathId(req), keyOf(req, 'handover-withdraw', pathId(req), {})));
  });
  router.post('/tags/:id/acknowledge', authed, validate({ params: idParams }), async (req, res) => {
    const tagId = await acknowledgeNotices(sequelize, currentUser(req), pathId(req), keyOf(req, 'acknowledge', pathId(req), {}));
    res.json(await getTag(currentUser(req), tagId));
  });
  router.post('/tags/:id/photos', authed, requirePermission('annotateTag'), validate({ params: idParams }), singleFileUpload('photo', MAX_PHOTO_BYTES, 'photo'), async (req, res) => {
    const file = requireFile(req, 'photo', 'photo');
    const caption = typeof req.body?.caption === 'string' ? req.body.caption.trim().slice(0, 200) || null : null;
    const key = keyOf(req, 'photo', pathId(req), { caption, file: file.buffer });
    res.status(201).json(await addTagPhoto(sequelize, storage!, currentUser(req), pathId(req), file.buffer, caption, key));
  });
  router.post('/tags/:id/notes', authed, requirePermission('annotateTag'), validate({ params: idParams, body: tagNoteSchema }), async (req, res) => {
    res.status(201).json(await addTagNote(sequelize, currentUser(req), pathId(req), req.body.text, keyOf(req, 'note', pathId(req))));
  });
  return router;
}
