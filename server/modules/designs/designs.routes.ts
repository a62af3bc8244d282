import { Router } from 'express';
import { designCreateInput, designUpdateInput } from '../../../shared/schemas/api.schema.js';
import { accessOf, idParam, requireRole, requireUser, userOf, type RoleLookup } from '../../middleware/auth.js';
import { parseVersionedBody } from '../../middleware/versioned-body.js';
import type { DesignsService } from './designs.service.js';

/** `/api/workshops/:wid/designs` — members read; owners and designers write. */
export function designRoutes(designs: DesignsService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  const read = requireRole(lookup, 'readDesigns');
  const edit = requireRole(lookup, 'editDesigns');
  router.use(requireUser);

  router.get('/', read, async (_req, res) => {
    res.json({ items: await designs.list(accessOf(res).workshopId) });
  });

  router.post('/', edit, async (req, res) => {
    const design = designCreateInput.parse(req.body);
    res.status(201).json(await designs.create(accessOf(res).workshopId, design, userOf(req).email));
  });

  router.get('/:id', read, async (req, res) => {
    res.json(await designs.get(accessOf(res).workshopId, idParam(req, 'id')));
  });

  router.put('/:id', edit, async (req, res) => {
    const id = idParam(req, 'id');
    // `{version, design}`: design errors use the same paths as on create (`outer.width`, not `design.outer.width`).
    const { version, design } = parseVersionedBody(designUpdateInput, req.body, 'design');
    res.json(await designs.update(accessOf(res).workshopId, id, version, design, userOf(req).email));
  });

  router.delete('/:id', edit, async (req, res) => {
    await designs.remove(accessOf(res).workshopId, idParam(req, 'id'), userOf(req).email);
    res.status(204).end();
  });

  router.post('/:id/duplicate', edit, async (req, res) => {
    res.status(201).json(await designs.duplicate(accessOf(res).workshopId, idParam(req, 'id'), userOf(req).email));
  });

  router.get('/:id/plan', read, async (req, res) => {
    res.json(await designs.plan(accessOf(res).workshopId, idParam(req, 'id')));
  });

  return router;
}
