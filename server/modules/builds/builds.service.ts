import { LockMode, type EntityManager } from '@mikro-orm/sqlite';
import { buildInput, type BuildDto, type BuildValues } from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import { recordAudit } from '../audit/audit.service.js';
import { CutPlan } from '../cut-plans/cut-plan.entity.js';
import { Design } from '../designs/design.entity.js';
import { Build } from './build.entity.js';

function describeItems(values: BuildValues): string {
  const cabinets = values.items.reduce((n, i) => n + i.quantity, 0);
  return `${values.items.length} design${values.items.length === 1 ? '' : 's'}, ${cabinets} cabinet${cabinets === 1 ? '' : 's'}`;
}

/** Builds of one workshop. Every method takes the workshop id the route checked, so ids never cross workshops. */
export class BuildsService {
  constructor(private readonly em: EntityManager) {}

  async list(workshopId: number): Promise<BuildDto[]> {
    const builds = await this.em.find(Build, { workshop: workshopId }, { orderBy: { updatedAt: 'desc', id: 'desc' } });
    return this.toDtos(workshopId, builds);
  }

  async get(workshopId: number, id: number): Promise<BuildDto> {
    const [dto] = await this.toDtos(workshopId, [await this.find(workshopId, id)]);
    return dto!;
  }

  async create(workshopId: number, input: unknown, byEmail: string): Promise<BuildDto> {
    const values = await this.checked(workshopId, input);
    const id = await this.em.transactional(async (em) => {
      const build = em.create(Build, { workshop: workshopId, name: values.name, notes: values.notes, items: values.items, updatedBy: byEmail });
      await em.flush();
      recordAudit(em, { workshopId, subjectType: 'build', subjectId: build.id, action: 'create', summary: `Created build "${values.name}" (${describeItems(values)})`, actorEmail: byEmail });
      return build.id;
    });
    return this.get(workshopId, id);
  }

  /** Saves a new version; a stale `version` throws OptimisticLockError → 409. */
  async update(workshopId: number, id: number, version: number, input: unknown, byEmail: string): Promise<BuildDto> {
    const values = await this.checked(workshopId, input);
    const build = await this.em.findOneOrFail(Build, { id, workshop: workshopId }, { lockMode: LockMode.OPTIMISTIC, lockVersion: version });
    build.name = values.name;
    build.notes = values.notes;
    build.items = values.items;
    build.updatedBy = byEmail;
    recordAudit(this.em, { workshopId, subjectType: 'build', subjectId: id, action: 'update', summary: `Saved build "${values.name}" (${describeItems(values)})`, actorEmail: byEmail });
    await this.em.flush();
    return this.get(workshopId, id);
  }

  /** Deletes the build and its cut plans. */
  async remove(workshopId: number, id: number, byEmail: string): Promise<void> {
    await this.em.transactional(async (em) => {
      const build = await em.findOneOrFail(Build, { id, workshop: workshopId });
      await em.nativeDelete(CutPlan, { build: build.id, workshop: workshopId });
      recordAudit(em, { workshopId, subjectType: 'build', subjectId: id, action: 'delete', summary: `Deleted build "${build.name}" and its cut plans`, actorEmail: byEmail });
      em.remove(build);
    });
  }

  find(workshopId: number, id: number): Promise<Build> {
    return this.em.findOneOrFail(Build, { id, workshop: workshopId });
  }

  /** Shape (zod) and that every design is one of this workshop's. */
  private async checked(workshopId: number, input: unknown): Promise<BuildValues> {
    const values = buildInput.parse(input);
    const ids = values.items.map((i) => i.designId);
    const found = new Set((await this.em.find(Design, { id: { $in: ids }, workshop: workshopId }, { fields: ['id'] })).map((d) => d.id));
    const fields: Record<string, string> = {};
    values.items.forEach((item, i) => {
      if (!found.has(item.designId)) fields[`items[${i}].designId`] = 'no such design in this workshop';
    });
    if (Object.keys(fields).length > 0) throw AppError.invalid(`items: ${Object.values(fields)[0]}`, fields);
    return values;
  }

  private async toDtos(workshopId: number, builds: Build[]): Promise<BuildDto[]> {
    if (builds.length === 0) return [];
    const designIds = [...new Set(builds.flatMap((b) => b.items.map((i) => i.designId)))];
    const designs = await this.em.find(Design, { id: { $in: designIds }, workshop: workshopId }, { fields: ['id', 'name'] });
    const names = new Map(designs.map((d) => [d.id, d.name]));
    const plans = await this.em.find(
      CutPlan,
      { build: { $in: builds.map((b) => b.id) } },
      { fields: ['id', 'build', 'createdAt'], orderBy: { createdAt: 'asc', id: 'asc' } },
    );
    return builds.map((b) => {
      const own = plans.filter((p) => p.build.id === b.id);
      return {
        id: b.id,
        name: b.name,
        notes: b.notes,
        items: b.items.map((i) => ({ designId: i.designId, designName: names.get(i.designId) ?? null, quantity: i.quantity, mirroredPair: i.mirroredPair })),
        cabinetCount: b.items.reduce((n, i) => n + i.quantity, 0),
        cutPlanCount: own.length,
        latestCutPlanId: own.length ? own[own.length - 1]!.id : null,
        version: b.version,
        createdAt: b.createdAt.toISOString(),
        updatedAt: b.updatedAt.toISOString(),
        updatedBy: b.updatedBy ?? null,
      };
    });
  }
}
