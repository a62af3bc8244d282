import { createHash } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/sqlite';
import type { DriverParamsDto, UploadDto, UploadKind } from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import { recordAudit } from '../audit/audit.service.js';
import { Build } from '../builds/build.entity.js';
import { newStorageKey, type FileStorage } from '../../storage/storage.js';
import type { StockService } from '../stock/stock.service.js';
import { problemsMessage, problemsToFields } from './csv-table.js';
import { parseDriversCsv } from './drivers-csv.js';
import { sniffCsv, sniffPhoto } from './sniff.js';
import { Upload } from './upload.entity.js';

const MB = 1024 * 1024;
/** Largest file per kind: a phone photo is 2–8 MB (common practice); our CSVs are small text. */
export const UPLOAD_LIMITS: Record<UploadKind, number> = { photo: 10 * MB, 'drivers-csv': 1 * MB, 'stock-csv': 1 * MB };

export interface IncomingFile {
  buffer: Buffer;
  originalname: string;
}

export interface UploadSubject {
  type: string;
  id: number;
}

/** A file name safe to show and to put in Content-Disposition: no folders, no control characters, ≤ 200 chars. */
export function cleanFileName(name: string, fallback: string): string {
  const base = name.split(/[\\/]/).pop() ?? '';
  // eslint-disable-next-line no-control-regex
  const clean = base.replace(/[\u0000-\u001f\u007f"<>|:*?]/g, '').trim().slice(0, 200);
  return clean || fallback;
}

function toDto(u: Upload, workshopId: number): UploadDto {
  return {
    id: u.id,
    kind: u.kind,
    subjectType: u.subjectType ?? null,
    subjectId: u.subjectId ?? null,
    name: u.originalName,
    contentType: u.contentType,
    sizeBytes: u.sizeBytes,
    uploadedBy: u.uploadedBy,
    createdAt: u.createdAt.toISOString(),
    url: `/api/workshops/${workshopId}/uploads/${u.id}/file`,
  };
}

/** "12 kB", "3.4 MB" (1 kB = 1024 bytes, as the upload limits count). */
export function formatFileSize(bytes: number): string {
  return bytes < MB ? `${Math.max(1, Math.round(bytes / 1024))} kB` : `${(bytes / MB).toFixed(1)} MB`;
}

const KIND_WORDS: Record<UploadKind, string> = { photo: 'photo', 'drivers-csv': "drivers' parameters", 'stock-csv': 'stock CSV file' };

/**
 * Where an upload's history lives: the build it is attached to, else the upload itself (subject 'upload'; only
 * files sent through the API without a build — the client always attaches them to a build).
 */
function auditSubject(u: Upload): { subjectType: string; subjectId: number } {
  return u.subjectType && u.subjectId ? { subjectType: u.subjectType, subjectId: u.subjectId } : { subjectType: 'upload', subjectId: u.id };
}

function uploadSummary(u: Upload, drivers: number | null, imported: number | undefined): string {
  const extra =
    drivers !== null ? `${drivers} driver${drivers === 1 ? '' : 's'}, ` : imported !== undefined ? `${imported} row${imported === 1 ? '' : 's'} imported, ` : '';
  return `Added ${KIND_WORDS[u.kind]} "${u.originalName}" (${extra}${formatFileSize(u.sizeBytes)})`;
}

const unsupported = (reason: string) => new AppError(415, 'unsupported_file', `The file was not accepted: ${reason}.`, { file: reason });

/** Uploads of a workshop: checked by content, stored through the FileStorage, recorded in `uploads`. */
export class UploadsService {
  constructor(
    private readonly em: EntityManager,
    private readonly storage: FileStorage,
    private readonly stock: StockService,
  ) {}

  /**
   * Checks and stores one file. Photos must sniff as JPEG or PNG; CSVs as UTF-8 text whose every row is valid
   * (drivers' parameters are kept parsed; a stock CSV is imported, all rows or none).
   */
  async upload(
    workshopId: number,
    kind: UploadKind,
    file: IncomingFile | undefined,
    subject: UploadSubject | null,
    byEmail: string,
  ): Promise<UploadDto & { imported?: number; drivers?: DriverParamsDto[] }> {
    if (!file || file.buffer.length === 0) throw AppError.invalid('Choose a file to upload.', { file: 'choose a file' });
    if (subject?.type === 'build' && (await this.em.count(Build, { id: subject.id, workshop: workshopId })) === 0) {
      throw AppError.invalid('buildId: no such build in this workshop', { buildId: 'no such build in this workshop' });
    }
    if (file.buffer.length > UPLOAD_LIMITS[kind]) throw tooLarge(kind);
    const sniffed = kind === 'photo' ? await sniffPhoto(file.buffer) : await sniffCsv(file.buffer);
    if (!sniffed.ok) throw unsupported(sniffed.reason);

    let parsed: DriverParamsDto[] | null = null;
    let imported: number | undefined;
    if (kind === 'drivers-csv') {
      const table = parseDriversCsv(file.buffer.toString('utf8'));
      if (table.problems.length) throw AppError.invalid(problemsMessage(table.problems), problemsToFields(table.problems));
      parsed = table.rows;
    } else if (kind === 'stock-csv') {
      imported = (await this.stock.importCsv(workshopId, file.buffer.toString('utf8'), byEmail)).imported;
    }

    const key = newStorageKey(kind, sniffed.extension);
    await this.storage.put(key, file.buffer);
    try {
      // The row and its history entry in one transaction (the entry may need the new row's id).
      const upload = await this.em.fork().transactional(async (em) => {
        const row = em.create(Upload, {
          workshop: workshopId,
          kind,
          subjectType: subject?.type ?? null,
          subjectId: subject?.id ?? null,
          originalName: cleanFileName(file.originalname, `${kind}.${sniffed.extension}`),
          storageKey: key,
          contentType: sniffed.contentType,
          sizeBytes: file.buffer.length,
          sha256: createHash('sha256').update(file.buffer).digest('hex'),
          parsed,
          uploadedBy: byEmail,
        });
        await em.flush();
        recordAudit(em, { workshopId, ...auditSubject(row), action: 'upload', summary: uploadSummary(row, parsed ? parsed.length : null, imported), actorEmail: byEmail });
        return row;
      });
      return { ...toDto(upload, workshopId), ...(imported !== undefined ? { imported } : {}), ...(parsed ? { drivers: parsed } : {}) };
    } catch (err) {
      await this.storage.delete(key);
      throw err;
    }
  }

  async list(workshopId: number, filter: { kind?: UploadKind; subject?: UploadSubject } = {}): Promise<UploadDto[]> {
    const where: Record<string, unknown> = { workshop: workshopId };
    if (filter.kind) where.kind = filter.kind;
    if (filter.subject) Object.assign(where, { subjectType: filter.subject.type, subjectId: filter.subject.id });
    const rows = await this.em.find(Upload, where, { orderBy: { createdAt: 'desc', id: 'desc' }, limit: 500 });
    return rows.map((u) => toDto(u, workshopId));
  }

  async drivers(workshopId: number, id: number): Promise<DriverParamsDto[]> {
    const upload = await this.em.findOneOrFail(Upload, { id, workshop: workshopId, kind: 'drivers-csv' });
    return (upload.parsed as DriverParamsDto[] | null) ?? [];
  }

  async file(workshopId: number, id: number): Promise<{ upload: UploadDto; data: Buffer }> {
    const upload = await this.em.findOneOrFail(Upload, { id, workshop: workshopId });
    const data = await this.storage.get(upload.storageKey);
    if (!data) throw AppError.notFound('The file is missing from the storage.');
    return { upload: toDto(upload, workshopId), data };
  }

  /** Deletes the record and its history entry in one flush, then the bytes. */
  async remove(workshopId: number, id: number, byEmail: string): Promise<void> {
    const upload = await this.em.findOneOrFail(Upload, { id, workshop: workshopId });
    const key = upload.storageKey;
    recordAudit(this.em, { workshopId, ...auditSubject(upload), action: 'delete-upload', summary: `Removed ${KIND_WORDS[upload.kind]} "${upload.originalName}"`, actorEmail: byEmail });
    this.em.remove(upload);
    await this.em.flush();
    await this.storage.delete(key);
  }
}

export function tooLarge(kind: UploadKind): AppError {
  const mb = UPLOAD_LIMITS[kind] / MB;
  return new AppError(413, 'file_too_large', `The file is larger than ${mb} MB, the limit for ${kind === 'photo' ? 'a photo' : 'a CSV file'}.`, { file: `at most ${mb} MB` });
}
