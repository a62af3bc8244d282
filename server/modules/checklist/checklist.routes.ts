import { Router } from 'express';
import { accessOf, idParam, requireRole, requireUser, userOf, type RoleLookup } from '../../middleware/auth.js';
import type { ChecklistService } from './checklist.service.js';

/** `/api/workshops/:wid/cut-plans/:planId/checklist` — every member reads; owners and makers tick (PERMISSIONS.tickParts). */
export function checklistRoutes(checklist: ChecklistService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  router.use(requireUser);
  router.get('/', requireRole(lookup, 'readPlans'), async (req, res) => {
    res.json(await checklist.get(accessOf(res).workshopId, idParam(req, 'planId')));
  });
  router.post('/ticks', requireRole(lookup, 'tickParts'), async (req, res) => {
    res.json(await checklist.tick(accessOf(res).workshopId, idParam(req, 'planId'), req.body, userOf(req).email));
  });
  return router;
}
