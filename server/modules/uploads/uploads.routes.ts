import { Router, type NextFunction, type Request, type RequestHandler, type Response } from 'express';
import multer from 'multer';
import { can, UPLOAD_KINDS, type UploadKind } from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import { accessOf, idParam, requireRole, requireUser, userOf, type RoleLookup } from '../../middleware/auth.js';
import { tooLarge, UPLOAD_LIMITS, type UploadsService, type UploadSubject } from './uploads.service.js';

/** One file in the multipart field `file`, held in memory up to the kind's limit; multer's errors become JSON errors. */
export function singleFile(kind: UploadKind): RequestHandler {
  const handler = multer({ storage: multer.memoryStorage(), limits: { fileSize: UPLOAD_LIMITS[kind], files: 1, fields: 10, parts: 12 } }).single('file');
  return (req: Request, res: Response, next: NextFunction) => {
    handler(req, res, (err?: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(tooLarge(kind));
        return next(AppError.invalid(`The upload was not accepted: ${err.message}.`, { file: err.message }));
      }
      next(err);
    });
  };
}

function kindParam(req: Request): UploadKind {
  const kind = req.params.kind as UploadKind;
  if (!UPLOAD_KINDS.includes(kind)) throw AppError.notFound();
  return kind;
}

function subjectOf(query: Request['query']): UploadSubject | null {
  const raw = query.buildId;
  if (raw === undefined) return null;
  if (typeof raw !== 'string' || !/^[1-9]\d{0,9}$/.test(raw)) throw AppError.invalid('buildId must be a build id.', { buildId: 'must be a build id' });
  return { type: 'build', id: Number(raw) };
}

/** Security headers for serving an uploaded file (OWASP File Upload Cheat Sheet; the CSP also sandboxes it). */
export function setSafeFileHeaders(res: Response, contentType: string, name: string): void {
  const inline = contentType === 'image/jpeg' || contentType === 'image/png';
  res.setHeader('Content-Type', contentType);
  res.setHeader('X-Content-Type-Options', 'nosniff');
  res.setHeader('Content-Security-Policy', "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; sandbox");
  res.setHeader('Cross-Origin-Resource-Policy', 'same-origin');
  res.setHeader('Cache-Control', 'private, no-cache');
  res.attachment(name);
  if (inline) res.setHeader('Content-Disposition', String(res.getHeader('Content-Disposition')).replace(/^attachment/, 'inline'));
}

/** `/api/workshops/:wid/uploads` — members list and open files; owners, designers and makers upload and delete. */
export function uploadRoutes(uploads: UploadsService, lookup: RoleLookup): Router {
  const router = Router({ mergeParams: true });
  const read = requireRole(lookup, 'readDesigns');
  const write = requireRole(lookup, 'uploadFiles');
  router.use(requireUser);

  router.get('/', read, async (req, res) => {
    const kind = typeof req.query.kind === 'string' && (UPLOAD_KINDS as readonly string[]).includes(req.query.kind) ? (req.query.kind as UploadKind) : undefined;
    res.json({ items: await uploads.list(accessOf(res).workshopId, { kind, subject: subjectOf(req.query) ?? undefined }) });
  });

  const byKind = Object.fromEntries(UPLOAD_KINDS.map((k) => [k, singleFile(k)])) as Record<UploadKind, RequestHandler>;
  router.post('/:kind', write, (req, res, next) => byKind[kindParam(req)](req, res, next), async (req, res) => {
    const kind = kindParam(req);
    if (kind === 'stock-csv') requireStockRole(res);
    res.status(201).json(await uploads.upload(accessOf(res).workshopId, kind, req.file, subjectOf(req.query), userOf(req).email));
  });

  router.get('/:id/drivers', read, async (req, res) => {
    res.json({ items: await uploads.drivers(accessOf(res).workshopId, idParam(req, 'id')) });
  });

  router.get('/:id/file', read, async (req, res) => {
    const { upload, data } = await uploads.file(accessOf(res).workshopId, idParam(req, 'id'));
    setSafeFileHeaders(res, upload.contentType, upload.name);
    res.send(data);
  });

  router.delete('/:id', write, async (req, res) => {
    await uploads.remove(accessOf(res).workshopId, idParam(req, 'id'), userOf(req).email);
    res.status(204).end();
  });
  return router;
}

function requireStockRole(res: Response): void {
  if (!can(accessOf(res).role, 'manageStock')) throw AppError.forbidden('Only owners and makers change the stock room.');
}
