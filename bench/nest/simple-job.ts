/**
 * A nest job as plain per-material groups for the npm packers: one sheet size per group, parts
 * pre-turned where grain demands it (the packers know no grain), turning allowed only where the job
 * allows it.
 */
import type { NestJob } from '../../shared/schemas/nest.schema.js';
import type { SimpleJob } from './npm-packers.js';

export function simpleGroups(job: NestJob): SimpleJob[] {
  const groups: SimpleJob[] = [];
  for (const s of job.stock) {
    const lengthAlongY = s.kind === 'roll' || (s.height ?? 0) >= s.width;
    const parts = job.parts.filter(
      (p) => (p.material === undefined || s.material === undefined || p.material === s.material) && (p.thickness === undefined || s.thickness === undefined || p.thickness === s.thickness),
    );
    const items: SimpleJob['items'] = [];
    for (const p of parts) {
      const grained = s.grain === 'length' && p.grain !== 'none';
      const turnNeeded = grained && (p.grain === 'height') !== lengthAlongY;
      for (let q = 0; q < p.quantity; q++) {
        if (grained) items.push(turnNeeded ? { w: p.height, h: p.width, turn: false } : { w: p.width, h: p.height, turn: false });
        else items.push({ w: p.width, h: p.height, turn: p.canRotate });
      }
    }
    if (items.length === 0) continue;
    groups.push({ W: s.width, H: s.kind === 'roll' ? (s.length ?? Infinity) : s.height!, kerf: job.kerf, trim: s.trim, items });
  }
  return groups;
}
