import { Router } from 'express';
import { parseVersionedBody } from '../../middleware/versioned-body.js';
import { STOCK_KINDS, stockUpdateInput, type StockKind } from '../../../shared/schemas/api.schema.js';
import { accessOf, idParam, requireRole, requireUser, userOf, type RoleLookup } from '../../middleware/auth.js';
import { singleFile } from '../uploads/uploads.routes.js';
import type { UploadsService } from '../uploads/uploads.service.js';
import type { StockService } from './stock.service.js';

/** `/api/workshops/:wid/stock` — owners, designers and makers read; owners and makers change (PERMISSIONS). */
export function stockRoutes(stock: StockService, uploads: UploadsService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  const read = requireRole(lookup, 'readStock');
  const manage = requireRole(lookup, 'manageStock');
  router.use(requireUser);

  router.get('/', read, async (req, res) => {
    const kind = typeof req.query.kind === 'string' && (STOCK_KINDS as readonly string[]).includes(req.query.kind) ? (req.query.kind as StockKind) : undefined;
    res.json({ items: await stock.listStock(accessOf(res).workshopId, { kind }) });
  });

  router.get('/export.csv', read, async (_req, res) => {
    const csv = await stock.exportCsv(accessOf(res).workshopId);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.attachment('stock-room.csv');
    res.send(csv);
  });

  /** Multipart field `file`: all rows or none; a bad row → 400 whose `fields` name "row N, column". */
  router.post('/import', manage, singleFile('stock-csv'), async (req, res) => {
    res.status(201).json(await uploads.upload(accessOf(res).workshopId, 'stock-csv', req.file, null, userOf(req).email));
  });

  router.post('/', manage, async (req, res) => {
    res.status(201).json(await stock.create(accessOf(res).workshopId, req.body, userOf(req).email));
  });

  router.get('/:id', read, async (req, res) => {
    res.json(await stock.get(accessOf(res).workshopId, idParam(req, 'id')));
  });

  router.put('/:id', manage, async (req, res) => {
    const id = idParam(req, 'id');
    // Item errors keep the form's paths (`widthMm`, not `item.widthMm`), like designs.
    const { version, item } = parseVersionedBody(stockUpdateInput, req.body, 'item');
    res.json(await stock.update(accessOf(res).workshopId, id, version, item, userOf(req).email));
  });

  router.delete('/:id', manage, async (req, res) => {
    await stock.remove(accessOf(res).workshopId, idParam(req, 'id'), userOf(req).email);
    res.status(204).end();
  });
  return router;
}
