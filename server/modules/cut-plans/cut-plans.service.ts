import type { EntityManager } from '@mikro-orm/sqlite';
import { buildLiningMassKg, type BuildCabinet } from '../../../shared/render/build.js';
import {
  cutPlanSettingsInput,
  type CutPlanCabinetDto,
  type CutPlanDto,
  type CutPlanPartDto,
  type CutPlanSettings,
  type CutPlanStockDto,
  type CutPlanSummaryDto,
} from '../../../shared/schemas/api.schema.js';
import type { Layout } from '../../../shared/schemas/nest.schema.js';
import { AppError } from '../../errors.js';
import { recordAudit } from '../audit/audit.service.js';
import { Build } from '../builds/build.entity.js';
import { Design } from '../designs/design.entity.js';
import { StockService } from '../stock/stock.service.js';
import {
  emptyLayout,
  groupJobs,
  layoutWarnings,
  liningMaterialFrom,
  partsOf,
  planBuild,
  planTotals,
  stockSnapshot,
  type CutPlanWarning,
  type PreparedGroup,
} from './assemble.js';
import { CutPlan } from './cut-plan.entity.js';

/** Everything a cut plan is made from, checked and ready for the nest worker. */
export interface PreparedCutPlan {
  workshopId: number;
  buildId: number;
  buildName: string;
  settings: CutPlanSettings;
  stock: CutPlanStockDto[];
  cabinets: CutPlanCabinetDto[];
  exportCabinets: BuildCabinet[];
  parts: CutPlanPartDto[];
  groups: PreparedGroup[];
  liningMassKg: number | null;
}

type SummaryFields = Pick<CutPlan, 'id' | 'build' | 'buildName' | 'mode' | 'totals' | 'warnings' | 'createdAt' | 'createdBy'>;

function toSummary(p: SummaryFields): CutPlanSummaryDto {
  return {
    id: p.id,
    buildId: p.build?.id ?? null,
    buildName: p.buildName,
    mode: p.mode === 'free' ? 'free' : 'guillotine',
    totals: p.totals,
    warningCount: p.warnings.length,
    createdAt: p.createdAt.toISOString(),
    createdBy: p.createdBy ?? null,
  };
}

function toDto(p: SummaryFields & Pick<CutPlan, 'settings' | 'stock' | 'parts' | 'cabinets' | 'groups'>): CutPlanDto {
  return {
    ...toSummary(p),
    settings: p.settings,
    stock: p.stock,
    parts: p.parts,
    cabinets: p.cabinets,
    groups: p.groups,
    warnings: p.warnings,
  };
}

/** What the exports of a cut plan are drawn from. */
export interface CutPlanExportSource {
  id: number;
  buildName: string;
  settings: CutPlanSettings;
  stock: CutPlanStockDto[];
  parts: CutPlanPartDto[];
  layouts: Layout[];
  exportCabinets: BuildCabinet[];
  liningMassKg: number | null;
  /** The workshop's currency (ISO 4217 code) shown after prices; null = plain numbers. */
  currency: string | null;
}

/** Cut plans of one workshop. Plans are made by nest jobs (prepare → worker → save) and never edited. */
export class CutPlansService {
  constructor(private readonly em: EntityManager) {}

  /** Checks the settings, the build, its designs and the stock, and makes the nest jobs. */
  async prepare(workshopId: number, buildId: number, settingsInput: unknown): Promise<PreparedCutPlan> {
    const settings = cutPlanSettingsInput.parse(settingsInput ?? {});
    const build = await this.em.findOne(Build, { id: buildId, workshop: workshopId });
    if (!build) throw AppError.invalid('buildId: no such build in this workshop', { buildId: 'no such build in this workshop' });
    const room = settings.typedStock ? [] : await new StockService(this.em).listStock(workshopId);
    const snap = stockSnapshot(settings, room);
    if (!snap.ok) throw AppError.invalid(snap.message, prefixed('settings', snap.fields));
    const designs = await this.em.find(Design, { id: { $in: build.items.map((i) => i.designId) }, workshop: workshopId });
    const planned = planBuild(build.items, new Map(designs.map((d) => [d.id, { id: d.id, data: d.data }])), liningMaterialFrom(snap.stock));
    if (!planned.ok) throw AppError.invalid(`This build cannot be planned: ${planned.message}`, planned.fields);
    const parts = partsOf(planned.value.exportCabinets);
    if (parts.length === 0) throw AppError.invalid('This build has no parts to cut.', { buildId: 'this build has no parts to cut' });
    return {
      workshopId,
      buildId: build.id,
      buildName: build.name,
      settings,
      stock: snap.stock,
      cabinets: planned.value.cabinets,
      exportCabinets: planned.value.exportCabinets,
      parts,
      groups: groupJobs(parts, snap.stock, settings),
      liningMassKg: buildLiningMassKg(planned.value.exportCabinets) ?? null,
    };
  }

  /**
   * Saves the plan with the layouts the worker found (`layouts` in the order of the groups that had a job).
   * `em` is a fork: this runs after the request that started the job has ended.
   */
  async save(em: EntityManager, prepared: PreparedCutPlan, layouts: readonly Layout[], byEmail: string): Promise<{ id: number; layouts: Layout[] }> {
    let next = 0;
    const groups = prepared.groups.map((g) => ({ meta: g.meta, layout: g.job ? layouts[next++]! : emptyLayout(g, prepared.parts) }));
    if (next !== layouts.length) throw new Error(`cut plan: ${layouts.length} layouts for ${next} nest jobs`);
    const all = groups.map((g) => g.layout);
    const warnings: CutPlanWarning[] = layoutWarnings(groups, prepared.parts);
    const build = await em.findOne(Build, { id: prepared.buildId, workshop: prepared.workshopId });
    if (!build) throw new Error('cut plan: the build was deleted while the plan was being made');
    const plan = em.create(CutPlan, {
      workshop: prepared.workshopId,
      build,
      buildName: prepared.buildName,
      mode: prepared.settings.mode,
      settings: prepared.settings,
      stock: prepared.stock,
      parts: prepared.parts,
      cabinets: prepared.cabinets,
      exportCabinets: prepared.exportCabinets,
      groups: groups.map((g) => ({ ...g.meta, layout: g.layout })),
      totals: planTotals(all, prepared.stock, prepared.liningMassKg),
      warnings,
      createdBy: byEmail,
    });
    await em.flush();
    const t = plan.totals;
    const summary = `Made a cut plan for "${prepared.buildName}": ${t.sheetsUsed} sheet${t.sheetsUsed === 1 ? '' : 's'}${t.rollLengthMm > 0 ? `, ${(t.rollLengthMm / 1000).toFixed(2)} m of lining roll` : ''}${t.partsUnplaced ? `, ${t.partsUnplaced} parts not placed` : ''}`;
    recordAudit(em, { workshopId: prepared.workshopId, subjectType: 'plan', subjectId: plan.id, action: 'create', summary, actorEmail: byEmail });
    recordAudit(em, { workshopId: prepared.workshopId, subjectType: 'build', subjectId: prepared.buildId, action: 'plan', summary: `${summary} (plan ${plan.id})`, actorEmail: byEmail });
    await em.flush();
    return { id: plan.id, layouts: all };
  }

  async list(workshopId: number, buildId?: number): Promise<CutPlanSummaryDto[]> {
    const where = buildId === undefined ? { workshop: workshopId } : { workshop: workshopId, build: buildId };
    const plans = await this.em.find(CutPlan, where, { orderBy: { createdAt: 'desc', id: 'desc' }, exclude: ['exportCabinets', 'parts', 'stock', 'groups'] });
    return plans.map((p) => toSummary(p));
  }

  async get(workshopId: number, id: number): Promise<CutPlanDto> {
    return toDto(await this.em.findOneOrFail(CutPlan, { id, workshop: workshopId }, { exclude: ['exportCabinets'] }));
  }

  async remove(workshopId: number, id: number, byEmail: string): Promise<void> {
    const plan = await this.em.findOneOrFail(CutPlan, { id, workshop: workshopId }, { exclude: ['exportCabinets'] });
    recordAudit(this.em, { workshopId, subjectType: 'plan', subjectId: id, action: 'delete', summary: `Deleted cut plan ${id} of "${plan.buildName}"`, actorEmail: byEmail });
    recordAudit(this.em, { workshopId, subjectType: 'build', subjectId: plan.build.id, action: 'delete-plan', summary: `Deleted cut plan ${id}`, actorEmail: byEmail });
    this.em.remove(plan);
    await this.em.flush();
  }

  /** The plan with its cabinets' plans, for the exports (also usable by share links, given the plan's workshop). */
  async exportSource(workshopId: number, id: number): Promise<CutPlanExportSource> {
    const p = await this.em.findOneOrFail(CutPlan, { id, workshop: workshopId }, { populate: ['workshop'] });
    return {
      id: p.id,
      buildName: p.buildName,
      settings: p.settings,
      stock: p.stock,
      parts: p.parts,
      layouts: p.groups.map((g) => g.layout),
      exportCabinets: p.exportCabinets,
      liningMassKg: p.totals.liningMassKg,
      currency: p.workshop.currency ?? null,
    };
  }
}

function prefixed(prefix: string, fields: Record<string, string>): Record<string, string> {
  return Object.fromEntries(Object.entries(fields).map(([k, v]) => [`${prefix}.${k}`, v]));
}


