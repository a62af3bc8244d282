import { Router } from 'express';
import { buildUpdateInput } from '../../../shared/schemas/api.schema.js';
import { accessOf, idParam, requireRole, requireUser, userOf, type RoleLookup } from '../../middleware/auth.js';
import { parseVersionedBody } from '../../middleware/versioned-body.js';
import type { BuildsService } from './builds.service.js';

/** `/api/workshops/:wid/builds` — members read; owners and designers write. */
export function buildRoutes(builds: BuildsService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  const read = requireRole(lookup, 'readDesigns');
  const edit = requireRole(lookup, 'editDesigns');
  router.use(requireUser);

  router.get('/', read, async (_req, res) => {
    res.json({ items: await builds.list(accessOf(res).workshopId) });
  });

  router.post('/', edit, async (req, res) => {
    res.status(201).json(await builds.create(accessOf(res).workshopId, req.body, userOf(req).email));
  });

  router.get('/:id', read, async (req, res) => {
    res.json(await builds.get(accessOf(res).workshopId, idParam(req, 'id')));
  });

  router.put('/:id', edit, async (req, res) => {
    const id = idParam(req, 'id');
    // `{version, build}`: build errors use the same paths as on create (`items[0].quantity`).
    const { version, build } = parseVersionedBody(buildUpdateInput, req.body, 'build');
    res.json(await builds.update(accessOf(res).workshopId, id, version, build, userOf(req).email));
  });

  router.delete('/:id', edit, async (req, res) => {
    await builds.remove(accessOf(res).workshopId, idParam(req, 'id'), userOf(req).email);
    res.status(204).end();
  });

  return router;
}
