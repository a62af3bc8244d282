import { Router, type Response } from 'express';
import { EXPORT_KINDS, renderCutPlanExport, type ExportFile, type ExportKind } from '../../export/cut-plan-exports.js';
import { accessOf, idParam, requireRole, requireUser, type RoleLookup } from '../../middleware/auth.js';
import type { CutPlansService } from '../cut-plans/cut-plans.service.js';

/** Sends an export as a download with a file name a person understands. */
export function sendExport(res: Response, file: ExportFile): void {
  res.setHeader('Content-Type', file.contentType);
  res.attachment(file.fileName);
  res.setHeader('Cache-Control', 'private, no-cache');
  res.setHeader('X-Content-Type-Options', 'nosniff');
  res.send(file.body);
}

/**
 * `/api/workshops/:wid/cut-plans/:id/exports/<file>` — every member, viewers included (PRODUCT.md §2: viewers
 * read the plans and exports they are shown). Files: cut-diagrams.pdf?paper, cut-diagrams.svg?sheet,
 * cut-list.csv, panels.dxf, stencils.pdf?paper&rollWidthMm&marginMm&overlapMm.
 */
export function exportRoutes(cutPlans: CutPlansService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  router.use(requireUser);
  const read = requireRole(lookup, 'readPlans');
  for (const kind of EXPORT_KINDS) {
    router.get(`/${kind}`, read, async (req, res) => {
      const source = await cutPlans.exportSource(accessOf(res).workshopId, idParam(req, 'id'));
      sendExport(res, await renderCutPlanExport(source, kind as ExportKind, req.query as Record<string, unknown>));
    });
  }
  return router;
}
