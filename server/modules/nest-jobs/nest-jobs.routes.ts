import { Router, type Request } from 'express';
import { AppError } from '../../errors.js';
import { accessOf, requireRole, requireUser, userOf, type RoleLookup } from '../../middleware/auth.js';
import type { NestJobsService } from './nest-jobs.service.js';

const JOB_ID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

function jobId(req: Request): string {
  const id = req.params.id;
  if (typeof id !== 'string' || !JOB_ID.test(id)) throw AppError.notFound('No such nest job.');
  return id;
}

/**
 * `/api/workshops/:wid/nest-jobs` — start (202), read progress, cancel. Starting and cancelling need
 * runCutPlans; every member may read a job's progress.
 */
export function nestJobRoutes(jobs: NestJobsService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  const read = requireRole(lookup, 'readPlans');
  const run = requireRole(lookup, 'runCutPlans');
  router.use(requireUser);

  router.post('/', run, async (req, res) => {
    const dto = await jobs.create(accessOf(res).workshopId, req.body, userOf(req).email);
    res.status(202).location(`${req.baseUrl}/${dto.id}`).json(dto);
  });

  router.get('/:id', read, (req, res) => {
    res.json(jobs.get(accessOf(res).workshopId, jobId(req)));
  });

  router.post('/:id/cancel', run, (req, res) => {
    res.json(jobs.cancel(accessOf(res).workshopId, jobId(req)));
  });

  return router;
}
