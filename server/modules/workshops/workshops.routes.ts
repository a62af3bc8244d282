import { Router } from 'express';
import { memberRoleInput } from '../../../shared/schemas/api.schema.js';
import { accessOf, idParam, requireRole, requireUser } from '../../middleware/auth.js';
import type { WorkshopsService } from './workshops.service.js';

/** `/api/workshops/:wid/members` — any member reads; owners change roles and remove members. */
export function memberRoutes(workshops: WorkshopsService): Router {
  const router = Router({ mergeParams: true });
  const lookup = workshops.roleOf.bind(workshops);
  router.use(requireUser);

  router.get('/', requireRole(lookup), async (_req, res) => {
    res.json({ items: await workshops.listMembers(accessOf(res).workshopId) });
  });

  router.patch('/:userId', requireRole(lookup, 'manageMembers'), async (req, res) => {
    const userId = idParam(req, 'userId');
    const { role } = memberRoleInput.parse(req.body);
    res.json(await workshops.changeRole(accessOf(res).workshopId, userId, role));
  });

  router.delete('/:userId', requireRole(lookup, 'manageMembers'), async (req, res) => {
    const userId = idParam(req, 'userId');
    await workshops.removeMember(accessOf(res).workshopId, userId);
    res.status(204).end();
  });

  return router;
}
