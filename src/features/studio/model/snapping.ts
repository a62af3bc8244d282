/**
 * Snapping of dragged and nudged positions: to a grid in mm or in sixteenths of an inch, and to centre
 * lines (the middle of the face, the centre of other items) when the pointer is close to one.
 */

import { MM_PER_INCH } from '../../../../shared/units/index';

export { MM_PER_INCH };

export type GridId = 'off' | 'mm1' | 'mm5' | 'mm10' | 'in16';

export interface GridOption {
  id: GridId;
  label: string;
  /** Grid step in mm (0 = no grid). */
  stepMm: number;
}

export const GRIDS: readonly GridOption[] = [
  { id: 'off', label: 'No grid', stepMm: 0 },
  { id: 'mm1', label: '1 mm', stepMm: 1 },
  { id: 'mm5', label: '5 mm', stepMm: 5 },
  { id: 'mm10', label: '10 mm', stepMm: 10 },
  { id: 'in16', label: '1/16 in', stepMm: MM_PER_INCH / 16 },
];

export function gridStepMm(id: GridId): number {
  return GRIDS.find((g) => g.id === id)?.stepMm ?? 0;
}

/** Rounds to the nearest grid line; snapping to 1/16 in works on an integer count of sixteenths. */
export function snapToGrid(valueMm: number, grid: GridId): number {
  if (grid === 'in16') {
    const sixteenths = Math.round((valueMm / MM_PER_INCH) * 16);
    return (sixteenths * MM_PER_INCH) / 16;
  }
  const step = gridStepMm(grid);
  if (step <= 0) return valueMm;
  return Math.round(valueMm / step) * step;
}

export interface SnapResult {
  valueMm: number;
  /** The centre line it snapped to, to draw as a guide; null when it snapped to the grid only. */
  guideMm: number | null;
}

/**
 * Snaps one coordinate: a centre line within `toleranceMm` wins (the nearest one), otherwise the grid.
 * `toleranceMm` is usually a few screen pixels converted at the current zoom.
 */
export function snapCoordinate(valueMm: number, grid: GridId, centresMm: readonly number[], toleranceMm: number): SnapResult {
  let best: number | null = null;
  for (const c of centresMm) {
    const d = Math.abs(c - valueMm);
    if (d <= toleranceMm && (best === null || d < Math.abs(best - valueMm))) best = c;
  }
  if (best !== null) return { valueMm: best, guideMm: best };
  return { valueMm: snapToGrid(valueMm, grid), guideMm: null };
}

/** The nudge step of an arrow key: one grid step (1 mm without a grid); Shift: ten of them. */
export function nudgeStepMm(grid: GridId, large: boolean): number {
  const step = gridStepMm(grid) || 1;
  return large ? step * 10 : step;
}
