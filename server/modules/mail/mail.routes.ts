import { Router } from 'express';
import { accessOf, requireRole, requireUser, type RoleLookup } from '../../middleware/auth.js';
import type { MailService } from './mail.service.js';

/** `/api/workshops/:wid/mail` — the owner's "Sent mail" list. */
export function mailRoutes(mail: MailService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  router.use(requireUser);
  router.get('/', requireRole(lookup, 'manageWorkshop'), async (_req, res) => {
    res.json({ items: await mail.list(accessOf(res).workshopId), via: mail.via });
  });
  return router;
}
