import { Router } from 'express';
import { invitationAcceptInput, invitationInput } from '../../../shared/schemas/api.schema.js';
import { accessOf, idParam, requireRole, requireUser, userOf, type RoleLookup } from '../../middleware/auth.js';
import type { SessionUser } from '../../session-user.js';
import { logIn } from '../auth/auth.passport.js';
import type { InvitationsService } from './invitations.service.js';

/** `/api/workshops/:wid/invitations` — owners invite, list and withdraw. */
export function invitationAdminRoutes(invitations: InvitationsService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  const owner = requireRole(lookup, 'manageMembers');
  router.use(requireUser);
  router.get('/', owner, async (_req, res) => {
    res.json({ items: await invitations.list(accessOf(res).workshopId) });
  });
  router.post('/', owner, async (req, res) => {
    const input = invitationInput.parse(req.body);
    res.status(201).json(await invitations.invite(accessOf(res).workshopId, input, userOf(req)));
  });
  router.delete('/:id', owner, async (req, res) => {
    await invitations.revoke(accessOf(res).workshopId, idParam(req, 'id'));
    res.status(204).end();
  });
  return router;
}

/**
 * `/api/invitations/:token` — the link's page: preview without an account, then accept (a new account
 * sets a password and is signed in; an existing account must be signed in as the invited e-mail).
 */
export function invitationLinkRoutes(invitations: InvitationsService, sessionUser: (id: number) => Promise<SessionUser | null>): Router {
  const router = Router();
  router.get('/:token', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await invitations.preview(String(req.params.token)));
  });
  router.post('/:token/accept', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    const { password } = invitationAcceptInput.parse(req.body ?? {});
    const { userId, workshopId } = await invitations.accept(String(req.params.token), password, req.user);
    if (!req.user) {
      const user = await sessionUser(userId);
      if (user) await logIn(req, user);
    }
    res.json({ workshopId });
  });
  return router;
}
