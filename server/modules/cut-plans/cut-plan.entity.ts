import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { BuildCabinet } from '../../../shared/render/build.js';
import type {
  CutPlanCabinetDto,
  CutPlanGroupDto,
  CutPlanPartDto,
  CutPlanSettings,
  CutPlanStockDto,
  CutPlanTotalsDto,
} from '../../../shared/schemas/api.schema.js';
import { Build } from '../builds/build.entity.js';
import { Workshop } from '../workshops/workshop.entity.js';

/**
 * A cut plan: the layouts of a build's panels on sheets and lining on rolls, with everything they were made
 * from kept as a snapshot (settings, stock, parts, the cabinets' plans), so the plan, its checklist and its
 * exports stay as they were cut even when designs or the stock room change later.
 *
 * Layout sheets name their stock by `CutPlanStockDto.id`; `stock[].stockItemId` is the stock room item.
 */
export const CutPlan = defineEntity({
  name: 'CutPlan',
  tableName: 'cut_plans',
  properties: {
    id: p.integer().primary().autoincrement(),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index(),
    /** The build it was made from; deleting the build deletes its plans. */
    build: p.manyToOne(Build).deleteRule('cascade').index(),
    /** The build's name when the plan was made. */
    buildName: p.string().length(120),
    mode: p.string().length(20),
    settings: p.json<CutPlanSettings>(),
    stock: p.json<CutPlanStockDto[]>(),
    parts: p.json<CutPlanPartDto[]>(),
    /** The build's lines: design, count, mirrored pair. */
    cabinets: p.json<CutPlanCabinetDto[]>(),
    /** The cabinets with their plans as they were (panels with holes, lining outlines): what exports draw (left out of lists). */
    exportCabinets: p.json<BuildCabinet[]>(),
    groups: p.json<CutPlanGroupDto[]>(),
    totals: p.json<CutPlanTotalsDto>(),
    warnings: p.json<{ code: string; message: string; field?: string }[]>(),
    createdAt: p.datetime().onCreate(() => new Date()),
    /** E-mail of the person who made it (text, survives the account). */
    createdBy: p.string().length(254).nullable(),
  },
});
export type CutPlan = InferEntity<typeof CutPlan>;
