import type { EntityManager } from '@mikro-orm/sqlite';
import { LockMode } from '@mikro-orm/sqlite';
import type { NestJobInput } from '../../../shared/schemas/nest.schema.js';
import {
  stockInput,
  type StockImportReport,
  type StockItemDto,
  type StockKind,
  type StockValues,
} from '../../../shared/schemas/api.schema.js';
import { AppError } from '../../errors.js';
import { recordAudit } from '../audit/audit.service.js';
import { problemsMessage, problemsToFields } from '../uploads/csv-table.js';
import { parseStockCsv, stockCsvText } from './stock-csv.js';
import { StockItem } from './stock-item.entity.js';

export function toStockDto(s: StockItem): StockItemDto {
  return {
    id: s.id,
    kind: s.kind,
    material: s.material,
    thicknessMm: s.thicknessMm,
    widthMm: s.widthMm,
    heightMm: s.heightMm ?? null,
    lengthMm: s.lengthMm ?? null,
    quantity: s.quantity ?? null,
    cost: s.cost ?? null,
    grain: s.grain,
    note: s.note,
    fromPlanId: s.fromPlanId ?? null,
    version: s.version,
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
    updatedBy: s.updatedBy ?? null,
  };
}

/** A stock item as the nest job's `stock[]` entry (PRODUCT.md §8); its id is the stock item's id as text. */
export function toNestStock(s: StockItemDto, trimMm = 0): NestJobInput['stock'][number] {
  return {
    id: String(s.id),
    kind: s.kind,
    width: s.widthMm,
    ...(s.kind === 'roll' ? (s.lengthMm !== null ? { length: s.lengthMm } : {}) : { height: s.heightMm ?? undefined }),
    quantity: s.quantity,
    trim: s.kind === 'roll' ? 0 : trimMm,
    grain: s.grain,
    ...(s.cost !== null ? { cost: s.cost } : {}),
    material: s.material,
    thickness: s.thicknessMm,
  };
}

export function describeStock(s: Pick<StockValues, 'kind' | 'material' | 'thicknessMm' | 'widthMm' | 'heightMm' | 'lengthMm'>): string {
  const size = s.kind === 'roll' ? `${s.widthMm} mm wide${s.lengthMm !== null ? `, ${s.lengthMm} mm long` : ''}` : `${s.widthMm} × ${s.heightMm} mm`;
  return `${s.kind} ${s.thicknessMm} mm ${s.material}, ${size}`;
}

export interface StockFilter {
  kind?: StockKind;
  material?: string;
  thicknessMm?: number;
}

/** An offcut of a cut plan to keep as a remnant. */
export interface KeptOffcut {
  material: string;
  thicknessMm: number;
  widthMm: number;
  heightMm: number;
  grain: 'none' | 'length';
  cost?: number | null;
  note?: string;
}

/** The stock room of one workshop. Every change writes an audit event in the same transaction. */
export class StockService {
  constructor(private readonly em: EntityManager) {}

  /** Sheets, remnants and rolls of a workshop (remnants first within a material, as the nesting uses them first). */
  async listStock(workshopId: number, filter: StockFilter = {}): Promise<StockItemDto[]> {
    const where: Record<string, unknown> = { workshop: workshopId };
    if (filter.kind) where.kind = filter.kind;
    if (filter.material) where.material = filter.material;
    if (filter.thicknessMm !== undefined) where.thicknessMm = filter.thicknessMm;
    const items = await this.em.find(StockItem, where, { orderBy: { material: 'asc', thicknessMm: 'asc', id: 'asc' } });
    const order: Record<StockKind, number> = { remnant: 0, sheet: 1, roll: 2 };
    return items
      .map(toStockDto)
      .sort((a, b) => a.material.localeCompare(b.material) || a.thicknessMm - b.thicknessMm || order[a.kind] - order[b.kind] || a.id - b.id);
  }

  async get(workshopId: number, id: number): Promise<StockItemDto> {
    return toStockDto(await this.find(workshopId, id));
  }

  async create(workshopId: number, input: unknown, byEmail: string): Promise<StockItemDto> {
    const values = stockInput.parse(input);
    return this.em.transactional(async (em) => {
      const item = em.create(StockItem, { workshop: workshopId, ...values, updatedBy: byEmail });
      await em.flush();
      recordAudit(em, { workshopId, subjectType: 'stock', subjectId: item.id, action: 'create', summary: `Added ${describeStock(values)}`, actorEmail: byEmail });
      return toStockDto(item);
    });
  }

  /** Saves a new version; a stale `version` throws OptimisticLockError → 409. */
  async update(workshopId: number, id: number, version: number, input: unknown, byEmail: string): Promise<StockItemDto> {
    const values = stockInput.parse(input);
    return this.em.transactional(async (em) => {
      const item = await em.findOneOrFail(StockItem, { id, workshop: workshopId }, { lockMode: LockMode.OPTIMISTIC, lockVersion: version });
      const changes = changedFields(toStockDto(item), values);
      em.assign(item, { ...values, updatedBy: byEmail });
      recordAudit(em, {
        workshopId,
        subjectType: 'stock',
        subjectId: item.id,
        action: 'update',
        summary: changes.length ? `Changed ${changes.join(', ')}` : 'Saved without changes',
        actorEmail: byEmail,
      });
      return toStockDto(item);
    }).then(async (dto) => this.get(workshopId, dto.id));
  }

  async remove(workshopId: number, id: number, byEmail: string): Promise<void> {
    await this.em.transactional(async (em) => {
      const item = await em.findOneOrFail(StockItem, { id, workshop: workshopId });
      recordAudit(em, { workshopId, subjectType: 'stock', subjectId: id, action: 'delete', summary: `Removed ${describeStock(toStockDto(item))}`, actorEmail: byEmail });
      em.remove(item);
    });
  }

  /**
   * Imports a stock CSV (columns of STOCK_CSV_COLUMNS). Any bad row → 400 naming every bad row and column,
   * and nothing is written; otherwise every row is added in one transaction.
   */
  async importCsv(workshopId: number, csvText: string, byEmail: string): Promise<StockImportReport> {
    const parsed = parseStockCsv(csvText);
    if (parsed.problems.length) throw AppError.invalid(problemsMessage(parsed.problems), problemsToFields(parsed.problems));
    await this.em.transactional(async (em) => {
      const items = parsed.rows.map((values) => em.create(StockItem, { workshop: workshopId, ...values, updatedBy: byEmail }));
      await em.flush();
      for (const item of items) {
        recordAudit(em, { workshopId, subjectType: 'stock', subjectId: item.id, action: 'import', summary: `Imported ${describeStock(toStockDto(item))} from a CSV file`, actorEmail: byEmail });
      }
    });
    return { imported: parsed.rows.length, problems: [] };
  }

  async exportCsv(workshopId: number): Promise<string> {
    return stockCsvText(await this.listStock(workshopId));
  }

  /**
   * Takes a cut sheet out of stock: one piece of a sheet or remnant (a remnant used up is removed), or
   * `lengthMm` off a roll. Unlimited stock stays unlimited. Runs in the caller's transaction (its `em`).
   * Returns what was taken (pieces or mm; 0 for unlimited), or null when the item is no longer in the room.
   */
  async takeCut(workshopId: number, id: number, lengthMm: number, byEmail: string, reason: string, em: EntityManager = this.em): Promise<number | null> {
    const item = await em.findOne(StockItem, { id, workshop: workshopId });
    if (!item) return null;
    const audit = (summary: string) => recordAudit(em, { workshopId, subjectType: 'stock', subjectId: id, action: 'cut', summary, actorEmail: byEmail });
    if (item.kind === 'roll') {
      if (item.lengthMm === null || item.lengthMm === undefined) {
        audit(`${reason}: ${Math.round(lengthMm)} mm off the roll (length not tracked)`);
        return 0;
      }
      const left = Math.max(0, item.lengthMm - lengthMm);
      audit(`${reason}: roll ${item.lengthMm} → ${left} mm`);
      const taken = item.lengthMm - left;
      item.lengthMm = left;
      item.updatedBy = byEmail;
      return taken;
    }
    if (item.quantity === null || item.quantity === undefined) {
      audit(`${reason} (unlimited stock)`);
      return 0;
    }
    if (item.quantity === 0) {
      audit(`${reason} (none left in stock)`);
      return 0;
    }
    audit(`${reason}: ${item.quantity} → ${item.quantity - 1}`);
    if (item.quantity === 1 && item.kind === 'remnant') em.remove(item);
    else {
      item.quantity -= 1;
      item.updatedBy = byEmail;
    }
    return 1;
  }

  /** Puts back what `takeCut` took (a sheet un-ticked). A used-up remnant is not brought back. */
  async putBack(workshopId: number, id: number, amount: number, byEmail: string, reason: string, em: EntityManager = this.em): Promise<void> {
    if (amount <= 0) return;
    const item = await em.findOne(StockItem, { id, workshop: workshopId });
    if (!item) return;
    const audit = (summary: string) => recordAudit(em, { workshopId, subjectType: 'stock', subjectId: id, action: 'update', summary, actorEmail: byEmail });
    if (item.kind === 'roll') {
      if (item.lengthMm === null || item.lengthMm === undefined) return;
      audit(`${reason}: roll ${item.lengthMm} → ${item.lengthMm + amount} mm`);
      item.lengthMm += amount;
    } else {
      if (item.quantity === null || item.quantity === undefined) return;
      audit(`${reason}: ${item.quantity} → ${item.quantity + amount}`);
      item.quantity += amount;
    }
    item.updatedBy = byEmail;
  }

  /** Removes remnants an un-ticked sheet had added, when they are still in the room unchanged. */
  async removeRemnants(workshopId: number, ids: number[], byEmail: string, reason: string, em: EntityManager = this.em): Promise<void> {
    if (!ids.length) return;
    const items = await em.find(StockItem, { id: { $in: ids }, workshop: workshopId, kind: 'remnant', quantity: 1 });
    for (const item of items) {
      recordAudit(em, { workshopId, subjectType: 'stock', subjectId: item.id, action: 'delete', summary: `${reason}: removed offcut ${item.widthMm} × ${item.heightMm} mm`, actorEmail: byEmail });
      em.remove(item);
    }
  }

  /** Adds kept offcuts of a cut plan as remnants (quantity 1 each); returns their ids after the caller's flush. */
  async addRemnants(workshopId: number, planId: number, offcuts: KeptOffcut[], byEmail: string, em: EntityManager = this.em): Promise<StockItem[]> {
    const items = offcuts.map((o) =>
      em.create(StockItem, {
        workshop: workshopId,
        kind: 'remnant',
        material: o.material,
        thicknessMm: o.thicknessMm,
        widthMm: o.widthMm,
        heightMm: o.heightMm,
        lengthMm: null,
        quantity: 1,
        cost: o.cost ?? null,
        grain: o.grain,
        note: o.note ?? `offcut of cut plan ${planId}`,
        fromPlanId: planId,
        updatedBy: byEmail,
      }),
    );
    await em.flush();
    for (const item of items) {
      recordAudit(em, { workshopId, subjectType: 'stock', subjectId: item.id, action: 'create', summary: `Kept offcut ${item.widthMm} × ${item.heightMm} mm from cut plan ${planId}`, actorEmail: byEmail });
    }
    return items;
  }

  private find(workshopId: number, id: number): Promise<StockItem> {
    return this.em.findOneOrFail(StockItem, { id, workshop: workshopId });
  }
}

const FIELD_LABELS: Array<[keyof StockValues, string]> = [
  ['kind', 'kind'],
  ['material', 'material'],
  ['thicknessMm', 'thickness'],
  ['widthMm', 'width'],
  ['heightMm', 'height'],
  ['lengthMm', 'length'],
  ['quantity', 'quantity'],
  ['cost', 'cost'],
  ['grain', 'grain'],
  ['note', 'note'],
];

function changedFields(before: StockItemDto, after: StockValues): string[] {
  const out: string[] = [];
  for (const [key, label] of FIELD_LABELS) {
    const a = before[key];
    const b = after[key];
    if (a !== b) out.push(`${label} ${a ?? '—'} → ${b ?? '—'}`);
  }
  return out;
}
