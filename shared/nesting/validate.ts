/**
 * Independent layout validator: checks a layout against its job without using any of the engine's
 * code. Returns a list of problems, [] when the layout is valid:
 * - every placement lies inside the trimmed sheet and matches its part's size (as given or turned);
 * - parts are at least one kerf apart;
 * - every part appears exactly once per unit of quantity (placed or listed as unplaced);
 * - a part turns only where canRotate and the grain allow it; stock of its own material/thickness;
 * - stock quantities are respected;
 * - guillotine mode: replaying the numbered cuts, each cut runs edge to edge of one piece, crosses
 *   no part, and in the end every piece holds at most one part.
 */
import type { Layout, LayoutSheet, NestJob, PartItem, StockItem } from '../schemas/nest.schema.js';

const TOL = 1e-6;

interface Rect {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

function grainAlongY(stock: StockItem): boolean {
  if (stock.kind === 'roll') return true;
  return (stock.height ?? 0) >= stock.width;
}

function turnAllowed(part: PartItem, stock: StockItem, turned: boolean): boolean {
  if (stock.grain === 'length' && part.grain !== 'none') {
    // After placing, the part's grain axis must be the sheet's length axis.
    const partGrainAlongY = (part.grain === 'height') !== turned;
    if (partGrainAlongY !== grainAlongY(stock)) return false;
  }
  return turned ? part.canRotate : true;
}

function materialOk(part: PartItem, stock: StockItem): boolean {
  if (part.material && stock.material && part.material.trim().toLowerCase() !== stock.material.trim().toLowerCase()) return false;
  if (part.thickness !== undefined && stock.thickness !== undefined && Math.abs(part.thickness - stock.thickness) > TOL) return false;
  return true;
}

function checkCuts(sheet: LayoutSheet, s: number, stock: StockItem, kerf: number, errors: string[]): void {
  const t = stock.trim;
  const pieces: Rect[] = [{ x0: t, y0: t, x1: sheet.width - t, y1: sheet.height - t }];
  const parts: Rect[] = sheet.placements.map((p) => ({ x0: p.x, y0: p.y, x1: p.x + p.width, y1: p.y + p.height }));
  const cuts = [...sheet.cuts].sort((a, b) => a.order - b.order);
  cuts.forEach((c, i) => {
    if (c.order !== i + 1) errors.push(`sheet ${s}: cut numbers are not 1..${cuts.length}`);
  });
  const lengthAlongY = grainAlongY(stock);
  for (const c of cuts) {
    const vertical = Math.abs(c.x1 - c.x2) <= TOL;
    const horizontal = Math.abs(c.y1 - c.y2) <= TOL;
    if (vertical === horizontal) {
      errors.push(`sheet ${s}: cut ${c.order} is not straight across`);
      return;
    }
    const expectKind = vertical === lengthAlongY ? 'rip' : 'cross';
    if (c.kind !== expectKind) errors.push(`sheet ${s}: cut ${c.order} should be a ${expectKind} cut`);
    const at = vertical ? c.x1 : c.y1;
    const lo = Math.min(vertical ? c.y1 : c.x1, vertical ? c.y2 : c.x2);
    const hi = Math.max(vertical ? c.y1 : c.x1, vertical ? c.y2 : c.x2);
    const band0 = at - kerf / 2;
    const band1 = at + kerf / 2;
    const idx = pieces.findIndex((p) =>
      vertical
        ? Math.abs(p.y0 - lo) <= TOL && Math.abs(p.y1 - hi) <= TOL && band1 > p.x0 + TOL && band0 < p.x1 - TOL
        : Math.abs(p.x0 - lo) <= TOL && Math.abs(p.x1 - hi) <= TOL && band1 > p.y0 + TOL && band0 < p.y1 - TOL,
    );
    if (idx < 0) {
      errors.push(`sheet ${s}: cut ${c.order} does not run edge to edge of a piece`);
      return;
    }
    const piece = pieces[idx]!;
    for (const p of parts) {
      const crosses = vertical
        ? p.x0 < band1 - TOL && p.x1 > band0 + TOL && p.y0 < piece.y1 - TOL && p.y1 > piece.y0 + TOL
        : p.y0 < band1 - TOL && p.y1 > band0 + TOL && p.x0 < piece.x1 - TOL && p.x1 > piece.x0 + TOL;
      if (crosses) {
        errors.push(`sheet ${s}: cut ${c.order} runs through a part`);
        return;
      }
    }
    const next: Rect[] = vertical
      ? [
          { ...piece, x1: Math.min(piece.x1, band0) },
          { ...piece, x0: Math.max(piece.x0, band1) },
        ]
      : [
          { ...piece, y1: Math.min(piece.y1, band0) },
          { ...piece, y0: Math.max(piece.y0, band1) },
        ];
    pieces.splice(idx, 1, ...next.filter((r) => r.x1 - r.x0 > TOL && r.y1 - r.y0 > TOL));
  }
  for (const piece of pieces) {
    const inside = parts.filter((p) => p.x0 < piece.x1 - TOL && p.x1 > piece.x0 + TOL && p.y0 < piece.y1 - TOL && p.y1 > piece.y0 + TOL);
    if (inside.length > 1) {
      errors.push(`sheet ${s}: after the cuts a piece still holds ${inside.length} parts`);
      return;
    }
  }
}

export function validateLayout(job: NestJob, layout: Layout): string[] {
  const errors: string[] = [];
  const k = job.kerf;
  const stockById = new Map(job.stock.map((s) => [s.id, s]));
  const partById = new Map(job.parts.map((p) => [p.id, p]));
  const placed = new Map<string, number>();
  const sheetsOf = new Map<string, number>();
  layout.sheets.forEach((sheet, s) => {
    const stock = stockById.get(sheet.stockId);
    if (!stock) {
      errors.push(`sheet ${s}: unknown stock ${sheet.stockId}`);
      return;
    }
    sheetsOf.set(stock.id, (sheetsOf.get(stock.id) ?? 0) + 1);
    if (Math.abs(sheet.width - stock.width) > TOL) errors.push(`sheet ${s}: width ${sheet.width} is not the stock's ${stock.width}`);
    if (stock.kind === 'roll') {
      if (stock.length !== undefined && sheet.height > stock.length + TOL) errors.push(`sheet ${s}: uses more roll than its length`);
    } else if (Math.abs(sheet.height - (stock.height ?? NaN)) > TOL) {
      errors.push(`sheet ${s}: height ${sheet.height} is not the stock's ${stock.height}`);
    }
    const t = stock.trim;
    for (const p of sheet.placements) {
      const part = partById.get(p.partId);
      if (!part) {
        errors.push(`sheet ${s}: unknown part ${p.partId}`);
        continue;
      }
      placed.set(part.id, (placed.get(part.id) ?? 0) + 1);
      const asGiven = Math.abs(p.width - part.width) <= TOL && Math.abs(p.height - part.height) <= TOL;
      const turned = Math.abs(p.width - part.height) <= TOL && Math.abs(p.height - part.width) <= TOL;
      if (p.rotated ? !turned : !asGiven) errors.push(`sheet ${s}: part ${p.partId} has the wrong size for rotated=${p.rotated}`);
      if (!turnAllowed(part, stock, p.rotated)) {
        errors.push(`sheet ${s}: part ${p.partId} is ${p.rotated ? 'turned' : 'not turned'}, which its grain or canRotate forbids`);
      }
      if (!materialOk(part, stock)) errors.push(`sheet ${s}: part ${p.partId} is on stock of another material or thickness`);
      if (p.x < t - TOL || p.y < t - TOL || p.x + p.width > sheet.width - t + TOL || p.y + p.height > sheet.height - t + TOL) {
        errors.push(`sheet ${s}: part ${p.partId} at (${p.x}, ${p.y}) is outside the trimmed sheet`);
      }
    }
    // At least one kerf apart: sweep in x.
    const ps = [...sheet.placements].sort((a, b) => a.x - b.x);
    for (let i = 0; i < ps.length; i++) {
      const a = ps[i]!;
      for (let j = i + 1; j < ps.length; j++) {
        const b = ps[j]!;
        if (b.x >= a.x + a.width + k - TOL) break;
        const apartY = b.y >= a.y + a.height + k - TOL || a.y >= b.y + b.height + k - TOL;
        if (!apartY) errors.push(`sheet ${s}: parts ${a.partId} and ${b.partId} are closer than one kerf`);
      }
    }
    if (job.mode === 'guillotine') checkCuts(sheet, s, stock, k, errors);
  });
  for (const [id, n] of sheetsOf) {
    const q = stockById.get(id)!.quantity;
    if (q !== null && q !== undefined && n > q) errors.push(`stock ${id}: ${n} used but only ${q} available`);
  }
  const unplaced = new Map<string, number>();
  for (const u of layout.unplaced) unplaced.set(u.partId, (unplaced.get(u.partId) ?? 0) + u.quantity);
  for (const part of job.parts) {
    const n = (placed.get(part.id) ?? 0) + (unplaced.get(part.id) ?? 0);
    if (n !== part.quantity) errors.push(`part ${part.id}: ${n} placed or unplaced, quantity is ${part.quantity}`);
  }
  for (const id of new Set([...placed.keys(), ...unplaced.keys()])) {
    if (!partById.has(id)) errors.push(`unknown part ${id}`);
  }
  return errors;
}
