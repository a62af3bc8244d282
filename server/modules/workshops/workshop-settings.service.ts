import { LockMode, type EntityManager } from '@mikro-orm/sqlite';
import {
  USUAL_CUT_DEFAULTS,
  type CutDefaults,
  type Currency,
  type WorkshopDto,
  type WorkshopUpdateValues,
} from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import type { FileStorage } from '../../storage/storage.js';
import type { Logger } from '../../middleware/error-handler.js';
import { AuditEvent } from '../audit/audit.entity.js';
import { recordAudit } from '../audit/audit.service.js';
import { Build } from '../builds/build.entity.js';
import { ChecklistTick } from '../checklist/checklist-tick.entity.js';
import { CutPlan } from '../cut-plans/cut-plan.entity.js';
import { Design } from '../designs/design.entity.js';
import { Invitation } from '../invitations/invitation.entity.js';
import { MailMessage } from '../mail/mail-message.entity.js';
import { ShareLink } from '../share-links/share-link.entity.js';
import { StockItem } from '../stock/stock-item.entity.js';
import { Upload } from '../uploads/upload.entity.js';
import { Membership } from './membership.entity.js';
import { Workshop } from './workshop.entity.js';

/**
 * Everything a workshop owns, children before parents (foreign keys), so deleting them in this order
 * never trips a constraint. `workshops` itself goes last. Tests count rows of each.
 */
export const WORKSHOP_TABLES = [ChecklistTick, ShareLink, CutPlan, Build, Design, StockItem, Upload, Invitation, MailMessage, AuditEvent, Membership] as const;

function toDto(w: Workshop): WorkshopDto {
  return {
    id: w.id,
    name: w.name,
    currency: (w.currency ?? null) as Currency | null,
    cutDefaults: { ...USUAL_CUT_DEFAULTS, ...(w.cutDefaults ?? {}) },
    version: w.version,
  };
}

function describeDefaults(d: CutDefaults): string {
  return `kerf ${d.kerfMm} mm, edge trim ${d.trimMm} mm, offcuts from ${d.minOffcutMm} mm, ${d.mode}, ${d.timeLimitMs / 1000} s`;
}

/** Words for the History: what a settings change did, one clause per field that changed. */
function changeSummary(before: WorkshopDto, after: WorkshopDto): string[] {
  const parts: string[] = [];
  if (before.name !== after.name) parts.push(`Renamed the workshop "${before.name}" to "${after.name}"`);
  if (before.currency !== after.currency) parts.push(`Currency ${before.currency ?? 'none'} → ${after.currency ?? 'none'}`);
  if (JSON.stringify(before.cutDefaults) !== JSON.stringify(after.cutDefaults)) parts.push(`Default cut settings: ${describeDefaults(after.cutDefaults)}`);
  return parts;
}

/** What the delete needs of the nest jobs (NestJobsService). */
export interface WorkshopJobs {
  cancelForWorkshop(workshopId: number): number;
}

/**
 * The workshop itself (PRODUCT.md §2): any signed-in person starts one and owns it; its owners rename it,
 * set its currency and default cut settings, and delete it with everything it holds.
 */
export class WorkshopSettingsService {
  constructor(
    private readonly em: EntityManager,
    private readonly storage: FileStorage,
    private readonly logger: Pick<Logger, 'error'> = console,
    /** The nest jobs (in memory): a workshop's unfinished jobs are cancelled before it is deleted. */
    private readonly jobs: WorkshopJobs = { cancelForWorkshop: () => 0 },
  ) {}

  /** A new workshop with the user as its only owner. */
  async create(userId: number, name: string, byEmail: string): Promise<WorkshopDto> {
    return this.em.transactional(async (em) => {
      const workshop = em.create(Workshop, { name });
      em.create(Membership, { user: userId, workshop, role: 'owner' });
      await em.flush();
      recordAudit(em, { workshopId: workshop.id, subjectType: 'workshop', subjectId: workshop.id, action: 'create', summary: `Started the workshop "${name}"`, actorEmail: byEmail });
      await em.flush();
      return toDto(workshop);
    });
  }

  async get(workshopId: number): Promise<WorkshopDto> {
    return toDto(await this.em.findOneOrFail(Workshop, { id: workshopId }));
  }

  /** Changes the fields sent; a stale `version` throws OptimisticLockError → 409. The change and its audit event are one flush. */
  async update(workshopId: number, input: WorkshopUpdateValues, byEmail: string): Promise<WorkshopDto> {
    const workshop = await this.em.findOneOrFail(Workshop, { id: workshopId }, { lockMode: LockMode.OPTIMISTIC, lockVersion: input.version });
    const before = toDto(workshop);
    if (input.name !== undefined) workshop.name = input.name;
    if (input.currency !== undefined) workshop.currency = input.currency;
    if (input.cutDefaults !== undefined) workshop.cutDefaults = input.cutDefaults;
    const changes = changeSummary(before, toDto(workshop));
    if (changes.length === 0) return before;
    recordAudit(this.em, { workshopId, subjectType: 'workshop', subjectId: workshopId, action: 'update', summary: changes.join('; '), actorEmail: byEmail });
    await this.em.flush();
    return toDto(workshop);
  }

  /**
   * Deletes the workshop and every row it owns in one transaction, once `confirmName` matches its name. Its
   * unfinished nest jobs are cancelled first; the uploaded files are removed from storage after the commit (a
   * failed removal leaves an orphan file, logged, never a row pointing at nothing). Members keep their accounts
   * and their other workshops.
   */
  async remove(workshopId: number, confirmName: string): Promise<void> {
    const keys = await this.em.fork({ clear: true }).transactional(async (em) => {
      const workshop = await em.findOneOrFail(Workshop, { id: workshopId });
      if (confirmName.trim() !== workshop.name.trim()) {
        const message = `Type the workshop's name exactly as it is ("${workshop.name}") to delete it.`;
        throw AppError.invalid(message, { confirmName: "this is not the workshop's name" });
      }
      // Its queued and running nest jobs are cancelled first, so none saves a plan into it (a job already saving
      // either commits before this transaction, and its plan is deleted with the rest, or fails on the foreign
      // key after it, quietly, being cancelled). Should the delete then fail, those jobs stay cancelled.
      this.jobs.cancelForWorkshop(workshopId);
      const uploads = await em.find(Upload, { workshop: workshopId }, { fields: ['storageKey'] });
      // By entity name: the tables' types differ, their `workshop` reference is the same.
      for (const table of WORKSHOP_TABLES) await em.nativeDelete<{ workshop: number }>(table.meta.className, { workshop: workshopId });
      await em.nativeDelete(Workshop, { id: workshopId });
      return uploads.map((u) => u.storageKey);
    });
    for (const key of keys) {
      try {
        await this.storage.delete(key);
      } catch (err) {
        this.logger.error(`[workshop ${workshopId} deleted] could not remove the stored file ${key}:`, err instanceof Error ? err.message : err);
      }
    }
  }
}
