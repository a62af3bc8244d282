import { Router, type RequestHandler } from 'express';
import { EXPORT_KINDS, renderCutPlanExport, type ExportKind } from '../../export/cut-plan-exports.js';
import { accessOf, idParam, requireRole, requireUser, userOf, type RoleLookup } from '../../middleware/auth.js';
import type { ShareLinksService } from './share-links.service.js';

/** `/api/workshops/:wid/cut-plans/:planId/share-links` — those who may export a plan share it; members see the list. */
export function shareLinkAdminRoutes(links: ShareLinksService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  const share = requireRole(lookup, 'exportPlans');
  router.use(requireUser);
  router.get('/', share, async (req, res) => {
    res.json({ items: await links.list(accessOf(res).workshopId, idParam(req, 'planId')) });
  });
  router.post('/', share, async (req, res) => {
    res.status(201).json(await links.create(accessOf(res).workshopId, idParam(req, 'planId'), req.body, userOf(req).email));
  });
  router.delete('/:id', share, async (req, res) => {
    await links.revoke(accessOf(res).workshopId, idParam(req, 'planId'), idParam(req, 'id'), userOf(req).email);
    res.status(204).end();
  });
  return router;
}

/** The token is the only credential: never cached, never sent on as a referrer, never indexed. */
const privateLink: RequestHandler = (_req, res, next) => {
  res.setHeader('Cache-Control', 'no-store');
  res.setHeader('Referrer-Policy', 'no-referrer');
  res.setHeader('X-Robots-Tag', 'noindex');
  next();
};

/** `/api/share/:token` — no account: the one plan of the link and its exports; nothing else. */
export function sharedPlanRoutes(links: ShareLinksService): Router {
  const router = Router();
  router.use(privateLink);
  router.get('/:token', async (req, res) => {
    res.json(await links.open(String(req.params.token)));
  });
  for (const kind of EXPORT_KINDS) {
    router.get(`/:token/exports/${kind}`, async (req, res) => {
      const source = await links.exportSource(String(req.params.token));
      const file = await renderCutPlanExport(source, kind as ExportKind, req.query as Record<string, unknown>);
      res.setHeader('Content-Type', file.contentType);
      res.setHeader('X-Content-Type-Options', 'nosniff');
      res.attachment(file.fileName);
      res.send(file.body);
    });
  }
  return router;
}
