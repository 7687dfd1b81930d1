import { Router } from 'express';
import type { AppContext } from '@/server/app';
import { auth, currentUser, requirePermission } from '@/server/middleware/auth';
import { checkedQuery, pathId, validate } from '@/server/middleware/validate';
import { sinceLastVisit } from '@/server/services/since-last-visit.service';
import { endVisit, getVisit, listSiteVisits, startVisit, visitReportPdf } from '@/server/services/visits.service';
import { readPaging } from '@/shared/rules/paging';
import { idParams } from '@/shared/schemas/request';
import { endVisitSchema, startVisitSchema, visitFiltersQuery, type VisitFiltersQuery } from '@/shared/schemas/visits';

export function visitsRoutes({ config, sequelize }: AppContext) {
  const router = Router();
  const signedIn = auth(config.jwtSecret);
  const visitors = requirePermission('recordVisits');
  router.post('/sites/:id/visits', signedIn, visitors, validate({ params: idParams, body: startVisitSchema }), async (req, res) => {
    res.status(201).json(await startVisit(currentUser(req), pathId(req), req.body));
  });
  router.get('/sites/:id/visits', signedIn, visitors, validate({ params: idParams, query: visitFiltersQuery }), async (req, res) => {
    const q = checkedQuery<VisitFiltersQuery>(req);
    res.json(await listSiteVisits(currentUser(req), pathId(req), q, readPaging(q)));
  });
  router.get('/sites/:id/since-my-last-visit', signedIn, validate({ params: idParams }), async (req, res) => {
    res.json(await sinceLastVisit(currentUser(req), { siteId: pathId(req) }));
  });
  router.get('/plant-rooms/:id/since-my-last-visit', signedIn, validate({ params: idParams }), async (req, res) => {
    res.json(await sinceLastVisit(currentUser(req), { plantRoomId: pathId(req) }));
  });
  router.get('/visits/:id', signedIn, visitors, validate({ params: idParams }), async (req, res) => {
    res.json(await getVisit(currentUser(req), pathId(req)));
  });
  router.get('/visits/:id/report.pdf', signedIn, visitors, validate({ params: idParams }), async (req, res) => {
    const { pdf, fileName } = await visitReportPdf(currentUser(req), pathId(req));
    res.type('application/pdf').set('Content-Disposition', `attachment; filename="${fileName}"`).send(pdf);
  });
  router.post('/visits/:id/end', signedIn, visitors, validate({ params: idParams, body: endVisitSchema }), async (req, res) => {
    res.json(await endVisit(sequelize, currentUser(req), pathId(req), req.body));
  });
  return router;
}
