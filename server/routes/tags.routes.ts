import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser } from '@/server/middleware/auth';
import { parseId, validate } from '@/server/middleware/validate';
import { addTagNote, clearInAbsence, clearTag, extendTag, handOverTag } from '@/server/services/tag-actions.service';
import { addTagPhoto, getTag, listTags, raiseTag } from '@/server/services/tags.service';
import { MAX_PHOTO_BYTES } from '@/server/lib/photo-processing';
import { requireFile, singleFileUpload } from '@/server/lib/uploads';
import { readPaging } from '@/shared/rules/paging';
import { clearInAbsenceSchema, clearTagSchema, extendTagSchema, handoverSchema, raiseTagSchema, tagNoteSchema } from '@/shared/schemas/tags';

export function tagsRoutes({ config, sequelize, storage }: AppContext) {
  const router = Router();
  const authed = auth(config.jwtSecret);
  const id = parseId;

  router.post('/assets/:id/tags', authed, validate(raiseTagSchema), async (req, res) => {
    const key = req.get('idempotency-key')?.slice(0, 100) || null;
    const { tag, created } = await raiseTag(sequelize, currentUser(req), id(req.params.id), req.body, key);
    res.status(created ? 201 : 200).json(tag);
  });
  router.get('/tags', authed, async (req, res) => {
    const q = req.query as Record<string, string | undefined>;
    res.json(await listTags(currentUser(req), { status: q.status, kind: q.kind, assetId: q.assetId ? id(q.assetId) : undefined, siteId: q.siteId ? id(q.siteId) : undefined }, readPaging(req.query)));
  });
  router.get('/tags/:id', authed, async (req, res) => {
    res.json(await getTag(currentUser(req), id(req.params.id)));
  });
  router.post('/tags/:id/clear', authed, validate(clearTagSchema), async (req, res) => {
    res.json(await clearTag(sequelize, currentUser(req), id(req.params.id), req.body));
  });
  router.post('/tags/:id/clear-in-absence', authed, validate(clearInAbsenceSchema), async (req, res) => {
    res.json(await clearInAbsence(sequelize, currentUser(req), id(req.params.id), req.body));
  });
  router.post('/tags/:id/extend', authed, validate(extendTagSchema), async (req, res) => {
    res.json(await extendTag(sequelize, currentUser(req), id(req.params.id), req.body));
  });
  router.post('/tags/:id/handover', authed, validate(handoverSchema), async (req, res) => {
    res.json(await handOverTag(sequelize, currentUser(req), id(req.params.id), req.body));
  });
  router.post('/tags/:id/photos', authed, singleFileUpload('photo', MAX_PHOTO_BYTES, 'photo'), async (req, res) => {
    const file = requireFile(req, 'photo', 'photo');
    const caption = typeof req.body?.caption === 'string' ? req.body.caption.trim().slice(0, 200) || null : null;
    res.status(201).json(await addTagPhoto(sequelize, storage!, currentUser(req), id(req.params.id), file.buffer, caption));
  });
  router.post('/tags/:id/notes', authed, validate(tagNoteSchema), async (req, res) => {
    res.status(201).json(await addTagNote(sequelize, currentUser(req), id(req.params.id), req.body.text));
  });
  return router;
}
