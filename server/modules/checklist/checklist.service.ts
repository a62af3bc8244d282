import { UniqueConstraintViolationException, type EntityManager } from '@mikro-orm/sqlite';
import {
  checklistTickInput,
  type ChecklistDto,
  type ChecklistPartDto,
  type ChecklistProgressDto,
  type ChecklistSheetDto,
  type CutPlanGroupDto,
  type CutPlanStockDto,
} from '../../../shared/schemas/api.schema.js';
import { sheetName } from '../../../shared/render/cut-diagram.js';
import { numberSheets } from '../../../shared/render/cut-list.js';
import { AppError } from '../../errors.js';
import { recordAudit } from '../audit/audit.service.js';
import { CutPlan } from '../cut-plans/cut-plan.entity.js';
import type { StockService } from '../stock/stock.service.js';
import { ChecklistTick } from './checklist-tick.entity.js';

export const partKey = (partId: string, n: number) => `part:${partId}#${n}`;
export const sheetKey = (groupKey: string, index: number) => `sheet:${groupKey}/${index}`;

type Plan = Pick<CutPlan, 'id' | 'buildName' | 'parts' | 'groups' | 'stock'>;

interface SheetRef {
  dto: Omit<ChecklistSheetDto, 'cut'>;
  group: CutPlanGroupDto;
  stock: CutPlanStockDto | undefined;
  offcuts: { widthMm: number; heightMm: number }[];
}

function sheetsOf(plan: Plan): SheetRef[] {
  const out: SheetRef[] = [];
  // Numbered across the whole plan, as on the cut plan page and the cut diagrams (the key keeps the per-group index).
  const names = new Map(
    numberSheets(
      plan.groups.map((g) => g.layout),
      plan.stock.map((s) => ({ id: s.id, kind: s.kind })),
    ).map((n) => [n.sheet, sheetName(n)]),
  );
  for (const group of plan.groups) {
    group.layout.sheets.forEach((sheet, i) => {
      const stock = plan.stock.find((s) => s.id === sheet.stockId);
      const kind = stock?.kind ?? sheet.kind ?? 'sheet';
      const offcuts = kind === 'roll' ? [] : (sheet.offcuts ?? []).map((o) => ({ widthMm: o.width, heightMm: o.height }));
      out.push({
        group,
        stock,
        offcuts,
        dto: {
          key: sheetKey(group.key, i + 1),
          groupLabel: group.label,
          index: i + 1,
          label: names.get(sheet) ?? `Sheet ${i + 1}`,
          stockKind: kind,
          widthMm: sheet.width,
          heightMm: sheet.height,
          partCount: sheet.placements.length,
          offcuts,
          fromStockRoom: stock?.stockItemId != null,
        },
      });
    });
  }
  return out;
}

function piecesOf(plan: Plan): Omit<ChecklistPartDto, 'cut'>[] {
  const out: Omit<ChecklistPartDto, 'cut'>[] = [];
  for (const p of plan.parts) {
    for (let n = 1; n <= p.quantity; n++) {
      out.push({
        key: partKey(p.id, n),
        partId: p.id,
        n,
        of: p.quantity,
        kind: p.kind,
        name: p.name,
        cabinet: p.cabinet,
        widthMm: p.widthMm,
        heightMm: p.heightMm,
        thicknessMm: p.thicknessMm,
        material: p.material,
      });
    }
  }
  return out;
}

function progress(label: string, items: { cut: unknown }[]): ChecklistProgressDto {
  return { label, done: items.filter((i) => i.cut).length, total: items.length };
}

/**
 * The build checklist of a cut plan: every panel and lining piece (one row per piece), and every sheet.
 * Ticking records who and when; marking a sheet cut takes it from the stock room and keeps its offcuts as
 * remnants, in one transaction with the tick.
 */
export class ChecklistService {
  constructor(
    private readonly em: EntityManager,
    private readonly stock: StockService,
  ) {}

  async get(workshopId: number, planId: number): Promise<ChecklistDto> {
    const plan = await this.em.findOneOrFail(CutPlan, { id: planId, workshop: workshopId }, { exclude: ['exportCabinets'] });
    const ticks = await this.em.find(ChecklistTick, { cutPlan: planId });
    const marks = new Map(ticks.map((t) => [t.itemKey, { by: t.byEmail, at: t.at.toISOString() }]));
    const parts = piecesOf(plan).map((p) => ({ ...p, cut: marks.get(p.key) ?? null }));
    const sheets = sheetsOf(plan).map((s) => ({ ...s.dto, cut: marks.get(s.dto.key) ?? null }));
    const cabinetNames = [...new Set(parts.map((p) => p.cabinet))];
    return {
      planId: plan.id,
      buildId: plan.build?.id ?? null,
      buildName: plan.buildName,
      parts,
      sheets,
      cabinets: cabinetNames.map((c) => progress(c, parts.filter((p) => p.cabinet === c))),
      total: progress('All pieces', parts),
      sheetsProgress: progress('Sheets and roll lengths', sheets),
    };
  }

  /** Ticks or un-ticks one piece or sheet; ticking something already ticked (or un-ticking an open one) changes nothing. */
  async tick(workshopId: number, planId: number, input: unknown, byEmail: string): Promise<ChecklistDto> {
    const { item, key, cut } = checklistTickInput.parse(input);
    try {
      await this.em.fork({ clear: true }).transactional(async (em) => {
        const plan = await em.findOneOrFail(CutPlan, { id: planId, workshop: workshopId }, { exclude: ['exportCabinets'] });
        const existing = await em.findOne(ChecklistTick, { cutPlan: planId, itemKey: key });
        if (item === 'part') {
          const piece = piecesOf(plan).find((p) => p.key === key);
          if (!piece) throw AppError.invalid('No such piece in this cut plan.', { key: 'no such piece in this cut plan' });
          const what = `${piece.cabinet}: ${piece.name} ${piece.n}/${piece.of}`;
          if (cut && !existing) {
            em.create(ChecklistTick, { workshop: workshopId, cutPlan: planId, itemKey: key, byEmail });
            recordAudit(em, { workshopId, subjectType: 'plan', subjectId: planId, action: 'cut', summary: `Cut ${what}`, actorEmail: byEmail });
          } else if (!cut && existing) {
            em.remove(existing);
            recordAudit(em, { workshopId, subjectType: 'plan', subjectId: planId, action: 'uncut', summary: `Un-ticked ${what}`, actorEmail: byEmail });
          }
          return;
        }
        const sheet = sheetsOf(plan).find((s) => s.dto.key === key);
        if (!sheet) throw AppError.invalid('No such sheet in this cut plan.', { key: 'no such sheet in this cut plan' });
        const what = `${sheet.group.label} ${sheet.dto.label}`;
        const reason = `Cut plan ${planId}: ${what}`;
        if (cut && !existing) {
          const stockItemId = sheet.stock?.stockItemId ?? null;
          const taken = stockItemId === null ? null : await this.stock.takeCut(workshopId, stockItemId, sheet.dto.heightMm, byEmail, `${reason} cut`, em);
          const remnants = await this.stock.addRemnants(
            workshopId,
            planId,
            sheet.offcuts.map((o) => ({
              material: sheet.group.material,
              thicknessMm: sheet.group.thicknessMm,
              widthMm: o.widthMm,
              heightMm: o.heightMm,
              grain: sheet.stock?.grain ?? 'none',
              note: `offcut of ${what}, cut plan ${planId}`,
            })),
            byEmail,
            em,
          );
          em.create(ChecklistTick, {
            workshop: workshopId,
            cutPlan: planId,
            itemKey: key,
            byEmail,
            stockItemId: taken === null ? null : stockItemId,
            deducted: taken,
            remnantIds: remnants.map((r) => r.id),
          });
          recordAudit(em, {
            workshopId,
            subjectType: 'plan',
            subjectId: planId,
            action: 'cut',
            summary: `Marked ${what} cut${taken ? ' (taken from stock)' : ''}${remnants.length ? `; kept ${remnants.length} offcut${remnants.length === 1 ? '' : 's'}` : ''}`,
            actorEmail: byEmail,
          });
        } else if (!cut && existing) {
          if (existing.stockItemId != null && existing.deducted) {
            await this.stock.putBack(workshopId, existing.stockItemId, existing.deducted, byEmail, `${reason} un-ticked`, em);
          }
          await this.stock.removeRemnants(workshopId, existing.remnantIds ?? [], byEmail, `${reason} un-ticked`, em);
          em.remove(existing);
          recordAudit(em, { workshopId, subjectType: 'plan', subjectId: planId, action: 'uncut', summary: `Un-ticked ${what}; stock put back`, actorEmail: byEmail });
        }
      });
    } catch (err) {
      // Two people ticking the same thing at once: the unique index keeps one; the other sees it ticked.
      if (!(err instanceof UniqueConstraintViolationException)) throw err;
    }
    return this.get(workshopId, planId);
  }
}
