import { Router } from 'express';
import { AppError } from '../../errors.js';
import { accessOf, idParam, requireRole, requireUser, userOf, type RoleLookup } from '../../middleware/auth.js';
import type { CutPlansService } from './cut-plans.service.js';

/** `/api/workshops/:wid/cut-plans` — every member reads (viewers included); those who run cut plans delete them. */
export function cutPlanRoutes(cutPlans: CutPlansService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  const read = requireRole(lookup, 'readPlans');
  const run = requireRole(lookup, 'runCutPlans');
  router.use(requireUser);

  router.get('/', read, async (req, res) => {
    const raw = req.query.buildId;
    let buildId: number | undefined;
    if (raw !== undefined) {
      if (typeof raw !== 'string' || !/^[1-9]\d{0,9}$/.test(raw)) throw AppError.invalid('buildId: must be a build id', { buildId: 'must be a build id' });
      buildId = Number(raw);
    }
    res.json({ items: await cutPlans.list(accessOf(res).workshopId, buildId) });
  });

  router.get('/:id', read, async (req, res) => {
    res.json(await cutPlans.get(accessOf(res).workshopId, idParam(req, 'id')));
  });

  router.delete('/:id', run, async (req, res) => {
    await cutPlans.remove(accessOf(res).workshopId, idParam(req, 'id'), userOf(req).email);
    res.status(204).end();
  });

  return router;
}
