/**
 * From a build to nest jobs and back (pure: no database, no clock). A build's designs are planned by the
 * cabinet engine; mirrored pairs add the mirror-image cabinet; the parts are grouped by material and
 * thickness (panels on sheets and remnants) and by lining thickness (lining on rolls), one nest job per
 * group with only the stock that matches it. After nesting: totals and warnings.
 */
import { planDesign } from '../../../shared/cabinet/index.js';
import { nestJobSchema, type Layout, type NestJob, type NestJobInput } from '../../../shared/schemas/nest.schema.js';
import { cutPartsFromBuild, type BuildCabinet } from '../../../shared/render/build.js';
import { materialTotals, placedArea, type StockInfo } from '../../../shared/render/cut-list.js';
import { fmtMm } from '../../../shared/render/stencil-items.js';
import type {
  CutPlanCabinetDto,
  CutPlanGroupDto,
  CutPlanPartDto,
  CutPlanSettings,
  CutPlanStockDto,
  CutPlanTotalsDto,
  StockItemDto,
  StockValues,
} from '../../../shared/schemas/api.schema.js';
import type { Design } from '../../../shared/schemas/design.schema.js';
import type { PanelPlan, Plan } from '../../../shared/schemas/plan.types.js';
import type { BuildItemValue } from '../builds/build.entity.js';
import { mirrorDesign, MIRRORED_SUFFIX, samePanel } from '../builds/mirror.js';

export type CutPlanWarning = { code: string; message: string; field?: string };

/** Thickness match: stock and parts listed to 0.01 mm. */
const sameThickness = (a: number, b: number) => Math.abs(a - b) < 0.01;
const sameMaterial = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/** Lining is cut with a knife along a straight edge: no material is lost in the cut (common practice). */
export const LINING_KERF_MM = 0;
/** Every group gets at least this much search time (ms). */
const MIN_GROUP_MS = 200;

// ─── Stock ──────────────────────────────────────────────────────────────────────────────────────

/** The stock the plan may use: typed in for this plan, or chosen from the stock room (all of it by default). */
export function stockSnapshot(
  settings: CutPlanSettings,
  room: readonly StockItemDto[],
): { ok: true; stock: CutPlanStockDto[] } | { ok: false; message: string; fields: Record<string, string> } {
  const trimOf = (kind: string) => (kind === 'roll' ? 0 : settings.trimMm);
  if (settings.typedStock) {
    return {
      ok: true,
      stock: settings.typedStock.map((s: StockValues, i): CutPlanStockDto => ({
        id: `typed ${i + 1}`,
        stockItemId: null,
        kind: s.kind,
        material: s.material,
        thicknessMm: s.thicknessMm,
        widthMm: s.widthMm,
        heightMm: s.kind === 'roll' ? null : s.heightMm,
        lengthMm: s.kind === 'roll' ? s.lengthMm : null,
        quantity: s.quantity,
        cost: s.cost,
        grain: s.grain,
        trimMm: trimOf(s.kind),
      })),
    };
  }
  let chosen = room;
  if (settings.stockIds) {
    const fields: Record<string, string> = {};
    const byId = new Map(room.map((s) => [s.id, s]));
    settings.stockIds.forEach((id, i) => {
      if (!byId.has(id)) fields[`stockIds[${i}]`] = 'no such item in the stock room';
    });
    if (Object.keys(fields).length) return { ok: false, message: `stockIds: ${Object.values(fields)[0]}`, fields };
    const wanted = new Set(settings.stockIds);
    chosen = room.filter((s) => wanted.has(s.id));
  }
  if (chosen.length === 0) {
    const message = 'The stock room is empty: add stock to it, or type in the sheets and rolls to cut from.';
    return { ok: false, message, fields: { typedStock: message } };
  }
  return {
    ok: true,
    stock: chosen.map((s) => ({
      id: `#${s.id}`,
      stockItemId: s.id,
      kind: s.kind,
      material: s.material,
      thicknessMm: s.thicknessMm,
      widthMm: s.widthMm,
      heightMm: s.heightMm,
      lengthMm: s.lengthMm,
      quantity: s.quantity,
      cost: s.cost,
      grain: s.grain,
      trimMm: trimOf(s.kind),
    })),
  };
}

// ─── Cabinets and parts ─────────────────────────────────────────────────────────────────────────

export interface DesignSource {
  id: number;
  data: Design;
}

/**
 * The cabinets of one build line. A mirrored pair of q cabinets is q/2 as drawn and q/2 mirrored; parts the
 * two share are listed once for all q, parts that differ once per side ("Left side" for q/2 and
 * "Left side (mirrored)" for q/2), so the cut list, stencils and DXF never repeat a part.
 */
export function cabinetsForItem(name: string, count: number, mirrored: boolean, plan: Plan, mirroredPlan: Plan | null, material: string, liningMaterial: string): BuildCabinet[] {
  const base = { name, material, liningMaterial };
  if (!mirrored || !mirroredPlan) return [{ ...base, count, plan }];
  const half = count / 2;
  const panelTwin = (p: PanelPlan) => mirroredPlan.panels.find((m) => m.name === p.name);
  const sharedPanels = plan.panels.filter((p) => {
    const twin = panelTwin(p);
    return twin !== undefined && samePanel(p, twin);
  });
  const sharedNames = new Set(sharedPanels.map((p) => p.name));
  const pieceKey = (l: Plan['liningPieces'][number]) => JSON.stringify([l.name, l.width, l.height, l.outline, l.holes]);
  const mirroredPieceKeys = new Set(mirroredPlan.liningPieces.map(pieceKey));
  const sharedPieces = plan.liningPieces.filter((l) => mirroredPieceKeys.has(pieceKey(l)));
  const sharedPieceKeys = new Set(sharedPieces.map(pieceKey));
  const out: BuildCabinet[] = [{ ...base, count, plan: { panels: sharedPanels, liningPieces: sharedPieces, ...(plan.lining ? { lining: plan.lining } : {}) } }];
  const asDrawn = { panels: plan.panels.filter((p) => !sharedNames.has(p.name)), liningPieces: plan.liningPieces.filter((l) => !sharedPieceKeys.has(pieceKey(l))) };
  if (asDrawn.panels.length || asDrawn.liningPieces.length) out.push({ ...base, count: half, plan: asDrawn });
  const mirrorOnly = {
    panels: mirroredPlan.panels.filter((p) => !sharedNames.has(p.name)).map((p) => ({ ...p, name: p.name + MIRRORED_SUFFIX })),
    liningPieces: mirroredPlan.liningPieces.filter((l) => !sharedPieceKeys.has(pieceKey(l))).map((l) => ({ ...l, name: l.name + MIRRORED_SUFFIX })),
  };
  if (mirrorOnly.panels.length || mirrorOnly.liningPieces.length) out.push({ ...base, count: half, plan: mirrorOnly });
  return out;
}

export interface BuildCabinets {
  cabinets: CutPlanCabinetDto[];
  /** What the exports and the parts list are made from. */
  exportCabinets: BuildCabinet[];
}

/** Plans every design of the build; a missing or unplannable design is an error naming its line. */
export function planBuild(
  items: readonly BuildItemValue[],
  designs: ReadonlyMap<number, DesignSource>,
  liningMaterialFor: (thicknessMm: number) => string,
): { ok: true; value: BuildCabinets } | { ok: false; message: string; fields: Record<string, string> } {
  const fields: Record<string, string> = {};
  const cabinets: CutPlanCabinetDto[] = [];
  const exportCabinets: BuildCabinet[] = [];
  items.forEach((item, i) => {
    const source = designs.get(item.designId);
    if (!source) {
      fields[`items[${i}].designId`] = 'this design was deleted; edit the build';
      return;
    }
    const planned = planDesign(source.data);
    if (!planned.ok) {
      fields[`items[${i}].designId`] = `"${source.data.name}" cannot be planned: ${planned.message}`;
      return;
    }
    let mirroredPlan: Plan | null = null;
    if (item.mirroredPair) {
      const m = planDesign(mirrorDesign(planned.design));
      if (!m.ok) {
        fields[`items[${i}].mirroredPair`] = `the mirror image of "${source.data.name}" cannot be planned: ${m.message}`;
        return;
      }
      mirroredPlan = m.plan;
    }
    const d = planned.design;
    const lining = liningMaterialFor(d.lining?.thickness ?? 0);
    cabinets.push({ name: d.name, designId: source.id, count: item.quantity, mirrored: item.mirroredPair });
    exportCabinets.push(...cabinetsForItem(d.name, item.quantity, item.mirroredPair, planned.plan, mirroredPlan, d.material.name, lining));
  });
  if (Object.keys(fields).length) return { ok: false, message: `items: ${Object.values(fields)[0]}`, fields };
  return { ok: true, value: { cabinets, exportCabinets } };
}

export function partsOf(exportCabinets: readonly BuildCabinet[]): CutPlanPartDto[] {
  return cutPartsFromBuild(exportCabinets).filter((p) => p.quantity > 0);
}

/** Lining material for a lining thickness: the first roll of that thickness in the stock, else "lining". */
export function liningMaterialFrom(stock: readonly CutPlanStockDto[]): (thicknessMm: number) => string {
  return (t) => stock.find((s) => s.kind === 'roll' && sameThickness(s.thicknessMm, t))?.material ?? 'lining';
}

// ─── Groups and nest jobs ───────────────────────────────────────────────────────────────────────

export interface PreparedGroup {
  meta: Omit<CutPlanGroupDto, 'layout'>;
  partIds: string[];
  /** null when no stock fits the group at all (every part is then unplaced). */
  job: NestJob | null;
}

function stockUsable(s: CutPlanStockDto): boolean {
  if (s.quantity === 0) return false;
  if (2 * s.trimMm >= s.widthMm) return false;
  if (s.heightMm !== null && 2 * s.trimMm >= s.heightMm) return false;
  return true;
}

function nestStock(s: CutPlanStockDto): NestJobInput['stock'][number] {
  return {
    id: s.id,
    kind: s.kind,
    width: s.widthMm,
    ...(s.kind === 'roll' ? (s.lengthMm !== null ? { length: s.lengthMm } : {}) : { height: s.heightMm ?? undefined }),
    quantity: s.quantity,
    trim: s.trimMm,
    grain: s.grain,
    ...(s.cost !== null ? { cost: s.cost } : {}),
    material: s.material,
    thickness: s.thicknessMm,
  };
}

/** One group per panel material + thickness, one per lining thickness; each with its own stock and time share. */
export function groupJobs(parts: readonly CutPlanPartDto[], stock: readonly CutPlanStockDto[], settings: CutPlanSettings): PreparedGroup[] {
  const groups = new Map<string, { kind: 'panels' | 'lining'; material: string; thicknessMm: number; parts: CutPlanPartDto[] }>();
  for (const p of parts) {
    const kind = p.kind === 'lining' ? 'lining' : 'panels';
    const key = kind === 'lining' ? `lining|${p.thicknessMm}` : `${p.material.trim().toLowerCase()}|${p.thicknessMm}`;
    let g = groups.get(key);
    if (!g) groups.set(key, (g = { kind, material: p.material, thicknessMm: p.thicknessMm, parts: [] }));
    g.parts.push(p);
  }
  const total = parts.reduce((n, p) => n + p.quantity, 0);
  const out: PreparedGroup[] = [];
  // Panels first (by material, then thickness), then lining.
  const ordered = [...groups].sort(([, a], [, b]) => Number(a.kind === 'lining') - Number(b.kind === 'lining') || a.material.localeCompare(b.material) || a.thicknessMm - b.thicknessMm);
  for (const [key, g] of ordered) {
    const offered = stock.filter((s) =>
      g.kind === 'lining' ? s.kind === 'roll' && sameThickness(s.thicknessMm, g.thicknessMm) : s.kind !== 'roll' && sameMaterial(s.material, g.material) && sameThickness(s.thicknessMm, g.thicknessMm),
    );
    const usable = offered.filter(stockUsable);
    const count = g.parts.reduce((n, p) => n + p.quantity, 0);
    const label = g.kind === 'lining' ? `${usable[0]?.material ?? 'Lining'} ${fmtMm(g.thicknessMm)} mm` : `${g.material} ${fmtMm(g.thicknessMm)} mm`;
    const meta = { key, kind: g.kind, label, material: g.material, thicknessMm: g.thicknessMm, stockIds: usable.map((s) => s.id) };
    if (usable.length === 0) {
      out.push({ meta, partIds: g.parts.map((p) => p.id), job: null });
      continue;
    }
    const job = nestJobSchema.parse({
      kerf: g.kind === 'lining' ? LINING_KERF_MM : settings.kerfMm,
      mode: settings.mode,
      seed: settings.seed,
      timeLimitMs: Math.max(MIN_GROUP_MS, Math.floor((settings.timeLimitMs * count) / Math.max(1, total))),
      objective: settings.objective,
      minOffcut: { width: settings.minOffcutMm, height: settings.minOffcutMm },
      stock: usable.map(nestStock),
      // A part with grain may turn only where the stock's grain allows it (the engine decides from `grain`).
      parts: g.parts.map((p) => ({ id: p.id, width: p.widthMm, height: p.heightMm, quantity: p.quantity, canRotate: true, grain: p.grain, label: `${p.cabinet} — ${p.name}` })),
    } satisfies NestJobInput);
    out.push({ meta, partIds: g.parts.map((p) => p.id), job });
  }
  return out;
}

/** The layout of a group no stock fits: nothing placed. */
export function emptyLayout(group: PreparedGroup, parts: readonly CutPlanPartDto[]): Layout {
  const byId = new Map(parts.map((p) => [p.id, p]));
  return {
    sheets: [],
    unplaced: group.partIds.map((id) => ({ partId: id, quantity: byId.get(id)!.quantity, reason: 'no stock of this material and thickness' })),
    stats: { sheetsUsed: 0, utilisation: 0, elapsedMs: 0 },
  };
}

// ─── After nesting ──────────────────────────────────────────────────────────────────────────────

/** Plain warnings for everything that was not placed, naming the part, its cabinet and its size. */
export function layoutWarnings(groups: readonly { meta: PreparedGroup['meta']; layout: Layout }[], parts: readonly CutPlanPartDto[]): CutPlanWarning[] {
  const byId = new Map(parts.map((p) => [p.id, p]));
  const out: CutPlanWarning[] = [];
  for (const { meta, layout } of groups) {
    const noStock = layout.unplaced.filter((u) => u.reason === 'no stock of this material and thickness');
    if (noStock.length) {
      const n = noStock.reduce((a, u) => a + u.quantity, 0);
      out.push({
        code: 'no_stock',
        message:
          meta.kind === 'lining'
            ? `No lining roll ${fmtMm(meta.thicknessMm)} mm thick in the stock chosen: ${n} lining piece${n === 1 ? '' : 's'} not placed. Add a roll of this thickness.`
            : `No sheets of ${meta.label} in the stock chosen: ${n} panel${n === 1 ? '' : 's'} not placed. Add sheets of this material and thickness.`,
        field: meta.key,
      });
    }
    for (const u of layout.unplaced) {
      if (noStock.includes(u)) continue;
      const p = byId.get(u.partId);
      const what = p ? `${p.name} (${p.cabinet}, ${fmtMm(p.widthMm)} × ${fmtMm(p.heightMm)} mm)` : u.partId;
      const reason = u.reason ?? '';
      if (reason.startsWith('larger than every')) {
        out.push({ code: 'panel_larger_than_stock', message: `${what} is larger than every ${meta.kind === 'lining' ? 'roll' : 'sheet'} in stock (after the edge trim): ${u.quantity} not placed.`, field: u.partId });
      } else if (reason.startsWith('grain')) {
        out.push({ code: 'grain_conflict', message: `${what} cannot be laid with its grain along the grain of any sheet in stock: ${u.quantity} not placed.`, field: u.partId });
      } else {
        out.push({ code: 'not_enough_stock', message: `${what}: ${u.quantity} not placed — not enough stock. Add stock or allow more sheets.`, field: u.partId });
      }
    }
  }
  return out;
}

export function stockInfo(stock: readonly CutPlanStockDto[]): StockInfo[] {
  return stock.map((s) => ({
    id: s.id,
    kind: s.kind,
    ...(s.cost !== null ? { cost: s.cost } : {}),
    trim: s.trimMm,
    material: s.material,
    thickness: s.thicknessMm,
    grain: s.grain,
  }));
}

export function planTotals(layouts: readonly Layout[], stock: readonly CutPlanStockDto[], liningMassKg: number | null): CutPlanTotalsDto {
  const t = materialTotals(layouts, stockInfo(stock), liningMassKg ?? undefined);
  let wasteMm2 = 0;
  for (const l of layouts) {
    for (const s of l.sheets) {
      const offcuts = (s.offcuts ?? []).reduce((a, o) => a + o.width * o.height, 0);
      wasteMm2 += Math.max(0, s.width * s.height - placedArea(s) - offcuts);
    }
  }
  return {
    sheetsUsed: t.sheetsUsed,
    remnantsUsed: t.remnantsUsed,
    rollLengthMm: t.rollLengthMm,
    cost: t.cost === null ? null : Math.round(t.cost * 100) / 100,
    costIncomplete: t.costIncomplete,
    // Kept to 10 mg: rounding to grams here and to 10 g on the page would round twice (2.7349 → 2.735 →
    // 2.74) where the printout, rounding once, says 2.73.
    liningMassKg: liningMassKg === null ? null : Math.round(liningMassKg * 1e5) / 1e5,
    partsPlaced: t.partsPlaced,
    partsUnplaced: t.partsUnplaced,
    utilisation: t.utilisation,
    wasteM2: Math.round(wasteMm2 / 1e4) / 100,
    ...(t.sheetsLowerBound !== undefined ? { sheetsLowerBound: t.sheetsLowerBound } : {}),
  };
}
