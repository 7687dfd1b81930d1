import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser } from '@/server/middleware/auth';
import { validate } from '@/server/middleware/validate';
import { parseId } from '@/server/services/register-access';
import { sinceLastVisit } from '@/server/services/since-last-visit.service';
import { endVisit, getVisit, listSiteVisits, startVisit, visitReportPdf } from '@/server/services/visits.service';
import { readPaging } from '@/shared/rules/paging';
import { endVisitSchema, startVisitSchema, visitFiltersSchema } from '@/shared/schemas/visits';

export function visitsRoutes({ config, sequelize }: AppContext) {
  const router = Router();
  const signedIn = auth(config.jwtSecret);
  router.post('/sites/:id/visits', signedIn, validate(startVisitSchema), async (req, res) => {
    res.status(201).json(await startVisit(currentUser(req), parseId(req.params.id), req.body));
  });
  router.get('/sites/:id/visits', signedIn, async (req, res) => {
    const filters = await visitFiltersSchema.validate(req.query, { abortEarly: false, stripUnknown: true });
    res.json(await listSiteVisits(currentUser(req), parseId(req.params.id), filters, readPaging(req.query)));
  });
  router.get('/sites/:id/since-my-last-visit', signedIn, async (req, res) => {
    res.json(await sinceLastVisit(currentUser(req), { siteId: parseId(req.params.id) }));
  });
  router.get('/plant-rooms/:id/since-my-last-visit', signedIn, async (req, res) => {
    res.json(await sinceLastVisit(currentUser(req), { plantRoomId: parseId(req.params.id) }));
  });
  router.get('/visits/:id', signedIn, async (req, res) => {
    res.json(await getVisit(currentUser(req), parseId(req.params.id)));
  });
  router.get('/visits/:id/report.pdf', signedIn, async (req, res) => {
    const { pdf, fileName } = await visitReportPdf(currentUser(req), parseId(req.params.id));
    res.type('application/pdf').set('Content-Disposition', `attachment; filename="${fileName}"`).send(pdf);
  });
  router.post('/visits/:id/end', signedIn, validate(endVisitSchema), async (req, res) => {
    res.json(await endVisit(sequelize, currentUser(req), parseId(req.params.id), req.body));
  });
  return router;
}
