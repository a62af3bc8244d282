import { Router } from 'express';
import { can, type Permission } from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import { accessOf, idParam, requireRole, requireUser, type RoleLookup } from '../../middleware/auth.js';
import type { AuditService } from './audit.service.js';

/** Who may read the history of each kind of item: whoever may read the item. */
const READ: Record<string, Permission> = {
  design: 'readDesigns',
  plan: 'readDesigns',
  build: 'readDesigns',
  stock: 'readStock',
  /** A file sent without a build (API only); files of a build are in the build's history. */
  upload: 'readDesigns',
};

/** `/api/workshops/:wid/history/:subjectType/:id` — the "History" list of one item, newest first. */
export function auditRoutes(audit: AuditService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  router.use(requireUser);
  router.get('/:subjectType/:id', requireRole(lookup), async (req, res) => {
    const subjectType = String(req.params.subjectType);
    const permission = READ[subjectType];
    if (!permission) throw AppError.notFound();
    const { workshopId, role } = accessOf(res);
    if (!can(role, permission)) throw AppError.forbidden();
    res.json({ items: await audit.history(workshopId, subjectType, idParam(req, 'id')) });
  });
  return router;
}
