import { Router } from 'express';
import { workshopCreateInput, workshopDeleteInput, workshopUpdateInput } from '../../../shared/schemas/api.schema.js';
import { accessOf, requireRole, requireUser, userOf, type RoleLookup } from '../../middleware/auth.js';
import type { WorkshopSettingsService } from './workshop-settings.service.js';

/**
 * `/api/workshops` and `/api/workshops/:wid`: anyone signed in starts a workshop (and owns it); members read
 * its settings; owners change them and delete it. Sub-paths (`/:wid/members`…) belong to their own routers.
 */
export function workshopRoutes(settings: WorkshopSettingsService, lookup: RoleLookup): Router {
  const router = Router();
  const manage = requireRole(lookup, 'manageWorkshop');

  router.post('/', requireUser, async (req, res) => {
    const { name } = workshopCreateInput.parse(req.body);
    const user = userOf(req);
    res.status(201).json(await settings.create(user.id, name, user.email));
  });

  router.get('/:wid', requireUser, requireRole(lookup), async (_req, res) => {
    res.json(await settings.get(accessOf(res).workshopId));
  });

  router.patch('/:wid', requireUser, manage, async (req, res) => {
    const input = workshopUpdateInput.parse(req.body);
    res.json(await settings.update(accessOf(res).workshopId, input, userOf(req).email));
  });

  router.delete('/:wid', requireUser, manage, async (req, res) => {
    const { confirmName } = workshopDeleteInput.parse(req.body ?? {});
    await settings.remove(accessOf(res).workshopId, confirmName);
    res.status(204).end();
  });

  return router;
}
