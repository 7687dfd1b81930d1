import { Router, type Request } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { parseId, validate } from '@/server/middleware/validate';
import { addTagNote, addTagPhoto, clearInAbsence, clearTag, extendTag, proveTag } from '@/server/services/tag-actions.service';
import { acceptHandover, offerHandover, reassignInAbsence, withdrawHandover } from '@/server/services/tag-handover.service';
import { idempotencyFor } from '@/server/services/tag-history.service';
import { acknowledgeNotices, pendingNotices } from '@/server/services/tag-notices.service';
import { raiseTag } from '@/server/services/tag-raise.service';
import { getTag, listTagColleagues, listTags } from '@/server/services/tags.service';
import { MAX_PHOTO_BYTES } from '@/server/lib/photo-processing';
import { requireFile, singleFileUpload } from '@/server/lib/uploads';
import { readPaging } from '@/shared/rules/paging';
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
  const id = parseId;

  router.post('/assets/:id/tags', authed, requirePermission('raiseTag'), validate({ params: idParams, body: raiseTagSchema }), async (req, res) => {
    const assetId = id(req.params.id);
    const { tag, created } = await raiseTag(sequelize, currentUser(req), assetId, req.body, keyOf(req, 'raise', assetId));
    res.status(created ? 201 : 200).json(tag);
  });
  router.get('/tags', authed, async (req, res) => {
    const q = req.query as Record<string, string | undefined>;
    const filters = { status: q.status, kind: q.kind, assetId: q.assetId ? id(q.assetId) : undefined, siteId: q.siteId ? id(q.siteId) : undefined, offeredToMe: q.offeredTo === 'me' };
    res.json(await listTags(currentUser(req), filters, readPaging(req.query)));
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
    res.json(await getTag(currentUser(req), id(req.params.id)));
  });
  router.post('/tags/:id/clear', authed, validate({ params: idParams, body: clearTagSchema }), async (req, res) => {
    res.json(await clearTag(sequelize, currentUser(req), id(req.params.id), req.body, keyOf(req, 'clear', id(req.params.id))));
  });
  router.post('/tags/:id/clear-in-absence', authed, validate({ params: idParams, body: clearInAbsenceSchema }), async (req, res) => {
    res.json(await clearInAbsence(sequelize, currentUser(req), id(req.params.id), req.body, keyOf(req, 'clear-in-absence', id(req.params.id))));
  });
  router.post('/tags/:id/reassign-in-absence', authed, requirePermission('superviseTags'), validate({ params: idParams, body: reassignInAbsenceSchema }), async (req, res) => {
    res.json(await reassignInAbsence(sequelize, currentUser(req), id(req.params.id), req.body, keyOf(req, 'reassign-in-absence', id(req.params.id))));
  });
  router.post('/tags/:id/extend', authed, validate({ params: idParams, body: extendTagSchema }), async (req, res) => {
    res.json(await extendTag(sequelize, currentUser(req), id(req.params.id), req.body, keyOf(req, 'extend', id(req.params.id))));
  });
  router.post('/tags/:id/prove', authed, validate({ params: idParams, body: proofSchema }), async (req, res) => {
    res.status(201).json(await proveTag(sequelize, currentUser(req), id(req.params.id), req.body, keyOf(req, 'prove', id(req.params.id))));
  });
  router.post('/tags/:id/handover', authed, validate({ params: idParams, body: handoverOfferSchema }), async (req, res) => {
    res.json(await offerHandover(sequelize, currentUser(req), id(req.params.id), req.body, keyOf(req, 'handover-offer', id(req.params.id))));
  });
  router.post('/tags/:id/handover/accept', authed, validate({ params: idParams, body: handoverAcceptSchema }), async (req, res) => {
    res.json(await acceptHandover(sequelize, currentUser(req), id(req.params.id), req.body, keyOf(req, 'handover-accept', id(req.params.id))));
  });
  router.post('/tags/:id/handover/withdraw', authed, validate({ params: idParams }), async (req, res) => {
    res.json(await withdrawHandover(sequelize, currentUser(req), id(req.params.id), keyOf(req, 'handover-withdraw', id(req.params.id), {})));
  });
  router.post('/tags/:id/acknowledge', authed, validate({ params: idParams }), async (req, res) => {
    const tagId = await acknowledgeNotices(sequelize, currentUser(req), id(req.params.id), keyOf(req, 'acknowledge', id(req.params.id), {}));
    res.json(await getTag(currentUser(req), tagId));
  });
  router.post('/tags/:id/photos', authed, requirePermission('annotateTag'), validate({ params: idParams }), singleFileUpload('photo', MAX_PHOTO_BYTES, 'photo'), async (req, res) => {
    const file = requireFile(req, 'photo', 'photo');
    const caption = typeof req.body?.caption === 'string' ? req.body.caption.trim().slice(0, 200) || null : null;
    const key = keyOf(req, 'photo', id(req.params.id), { caption, file: file.buffer });
    res.status(201).json(await addTagPhoto(sequelize, storage!, currentUser(req), id(req.params.id), file.buffer, caption, key));
  });
  router.post('/tags/:id/notes', authed, requirePermission('annotateTag'), validate({ params: idParams, body: tagNoteSchema }), async (req, res) => {
    res.status(201).json(await addTagNote(sequelize, currentUser(req), id(req.params.id), req.body.text, keyOf(req, 'note', id(req.params.id))));
  });
  return router;
}
