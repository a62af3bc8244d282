/**
 * A build as the exports see it: cabinet designs × how many are built, with their plans, and the
 * parts list that maps a layout's `partId` to something a person can read.
 */
import type { NestJobInput } from '../schemas/nest.schema.js';
import type { CutPlanPartDto } from '../schemas/api.schema.js';
import type { Design } from '../schemas/design.schema.js';
import type { LiningPiecePlan, PanelPlan, Plan } from '../schemas/plan.types.js';
import { slugify } from './file-names.js';

/** One cabinet design of a build. */
export interface BuildCabinet {
  /** The design's name as the user sees it. */
  name: string;
  /** Cabinets built from this design (a pair is 2). */
  count: number;
  plan: {
    panels: readonly PanelPlan[];
    liningPieces: readonly LiningPiecePlan[];
    lining?: { massKg: number };
  };
  /** Panel material name ("MDF"); defaults to "panel". */
  material?: string;
  /** Lining material name; defaults to "lining". */
  liningMaterial?: string;
}

/**
 * One line of the parts list: what a placement with this `id` is — name, cabinet, cut size, thickness,
 * quantity for the whole build, grain, material. The cut-plan API sends the same shape.
 */
export type CutPart = CutPlanPartDto;

/**
 * The parts of a build: every panel and lining piece of every cabinet design, quantities multiplied
 * by the cabinet count. Ids are readable and unique: `harbour-bookshelf/left-side`.
 */
export function cutPartsFromBuild(cabinets: readonly BuildCabinet[]): CutPart[] {
  const used = new Set<string>();
  const uniqueId = (cabinet: string, part: string) => {
    const base = `${slugify(cabinet, 40)}/${slugify(part, 40)}`;
    let id = base;
    for (let n = 2; used.has(id); n++) id = `${base}-${n}`;
    used.add(id);
    return id;
  };
  const parts: CutPart[] = [];
  for (const c of cabinets) {
    for (const p of c.plan.panels) {
      parts.push({
        id: uniqueId(c.name, p.name),
        kind: 'panel',
        name: p.name,
        cabinet: c.name,
        widthMm: p.width,
        heightMm: p.height,
        thicknessMm: p.thickness,
        quantity: p.quantity * c.count,
        grain: p.grain,
        material: c.material ?? 'panel',
      });
    }
    for (const l of c.plan.liningPieces) {
      parts.push({
        id: uniqueId(c.name, l.name),
        kind: 'lining',
        name: l.name,
        cabinet: c.name,
        widthMm: l.width,
        heightMm: l.height,
        thicknessMm: l.thickness,
        quantity: l.quantity * c.count,
        grain: 'none',
        material: c.liningMaterial ?? 'lining',
      });
    }
  }
  return parts;
}

/** The nest job's parts for a parts list (a part with grain is never turned). */
export function nestPartsFromCutParts(parts: readonly CutPart[]): NestJobInput['parts'] {
  return parts.map((p) => ({
    id: p.id,
    width: p.widthMm,
    height: p.heightMm,
    quantity: p.quantity,
    canRotate: p.grain === 'none',
    grain: p.grain,
    material: p.material,
    thickness: p.thicknessMm,
    label: `${p.cabinet} — ${p.name}`,
  }));
}

/** Total lining mass of the build (kg), when the plans carry it. */
export function buildLiningMassKg(cabinets: readonly BuildCabinet[]): number | undefined {
  if (!cabinets.some((c) => c.plan.lining)) return undefined;
  return cabinets.reduce((sum, c) => sum + (c.plan.lining?.massKg ?? 0) * c.count, 0);
}

/** A build's cabinet from a planned design: its name, material, and the plan. */
export function buildCabinet(design: Design, plan: Plan, count: number, liningMaterial = 'polyester batt'): BuildCabinet {
  return { name: design.name, count, plan, material: design.material.name, liningMaterial };
}
