import { LockMode, type EntityManager } from '@mikro-orm/sqlite';
import { planDesign } from '../../../shared/cabinet/index.js';
import type { DesignDto, DesignSummaryDto } from '../../../shared/schemas/api.schema.js';
import type { Design as DesignJson } from '../../../shared/schemas/design.schema.js';
import type { Plan } from '../../../shared/schemas/plan.types.js';
import { AppError } from '../../errors.js';
import { recordAudit } from '../audit/audit.service.js';
import { Design } from './design.entity.js';

const NAME_MAX = 120;

function toSummary(d: Design): DesignSummaryDto {
  return {
    id: d.id,
    name: d.name,
    version: d.version,
    widthMm: d.data.outer.width,
    heightMm: d.data.outer.height,
    depthMm: d.data.outer.depth,
    braceCount: d.data.braces.length,
    openingCount: d.data.openings.length,
    createdAt: d.createdAt.toISOString(),
    updatedAt: d.updatedAt.toISOString(),
    updatedBy: d.updatedBy ?? null,
  };
}

function toDto(d: Design): DesignDto {
  return {
    id: d.id,
    name: d.name,
    version: d.version,
    design: d.data,
    createdAt: d.createdAt.toISOString(),
    updatedAt: d.updatedAt.toISOString(),
    updatedBy: d.updatedBy ?? null,
  };
}

/** A design is saved only when the cabinet engine can plan it; its errors come back with field paths. */
function plannable(input: unknown): DesignJson {
  const outcome = planDesign(input);
  if (!outcome.ok) throw AppError.invalid(outcome.message, outcome.fields);
  return outcome.design;
}

function copyName(name: string): string {
  const suffix = ' (copy)';
  return name.length + suffix.length <= NAME_MAX ? name + suffix : name.slice(0, NAME_MAX - suffix.length) + suffix;
}

/** Designs of one workshop. Every method takes the workshop id the route checked, so ids never cross workshops. */
export class DesignsService {
  constructor(private readonly em: EntityManager) {}

  async list(workshopId: number): Promise<DesignSummaryDto[]> {
    const designs = await this.em.find(Design, { workshop: workshopId }, { orderBy: { updatedAt: 'desc', id: 'desc' } });
    return designs.map(toSummary);
  }

  async get(workshopId: number, id: number): Promise<DesignDto> {
    return toDto(await this.find(workshopId, id));
  }

  async create(workshopId: number, input: unknown, byEmail: string): Promise<DesignDto> {
    const data = plannable(input);
    const design = this.em.create(Design, { workshop: workshopId, name: data.name, data, updatedBy: byEmail });
    await this.em.flush();
    await this.audit(workshopId, design.id, 'create', `Created "${data.name}"`, byEmail, true);
    return toDto(design);
  }

  /** Saves a new version; a stale `version` (someone saved in between) throws OptimisticLockError → 409. */
  async update(workshopId: number, id: number, version: number, input: unknown, byEmail: string): Promise<DesignDto> {
    const data = plannable(input);
    const design = await this.em.findOneOrFail(
      Design,
      { id, workshop: workshopId },
      { lockMode: LockMode.OPTIMISTIC, lockVersion: version },
    );
    design.data = data;
    design.name = data.name;
    design.updatedBy = byEmail;
    await this.audit(workshopId, id, 'update', `Saved "${data.name}" (version ${version + 1})`, byEmail);
    await this.em.flush();
    return toDto(design);
  }

  async remove(workshopId: number, id: number, byEmail?: string): Promise<void> {
    const design = await this.find(workshopId, id);
    await this.audit(workshopId, id, 'delete', `Deleted "${design.name}"`, byEmail);
    this.em.remove(design);
    await this.em.flush();
  }

  async duplicate(workshopId: number, id: number, byEmail: string): Promise<DesignDto> {
    const source = await this.find(workshopId, id);
    const name = copyName(source.name);
    const data: DesignJson = { ...structuredClone(source.data), name };
    const copy = this.em.create(Design, { workshop: workshopId, name, data, updatedBy: byEmail });
    await this.em.flush();
    await this.audit(workshopId, copy.id, 'create', `Duplicated "${source.name}" as "${name}"`, byEmail, true);
    return toDto(copy);
  }

  async plan(workshopId: number, id: number): Promise<Plan> {
    const design = await this.find(workshopId, id);
    const outcome = planDesign(design.data);
    if (!outcome.ok) throw AppError.invalid(`This saved design cannot be planned: ${outcome.message}`, outcome.fields);
    return outcome.plan;
  }

  /** History (server/modules/audit): recorded with the change's flush, or flushed at once after a create. */
  private async audit(workshopId: number, id: number, action: string, summary: string, byEmail: string | undefined, flush = false): Promise<void> {
    recordAudit(this.em, { workshopId, subjectType: 'design', subjectId: id, action, summary, actorEmail: byEmail ?? 'unknown' });
    if (flush) await this.em.flush();
  }

  private find(workshopId: number, id: number): Promise<Design> {
    return this.em.findOneOrFail(Design, { id, workshop: workshopId });
  }
}
