/**
 * Tiling a full-size drawing over pages.
 *
 * Along one axis, a piece of length L (mm) plus a padding p on both ends is covered by tiles whose
 * drawing area is D long, neighbours overlapping by o. Tile i covers [i·(D − o), i·(D − o) + D], so n
 * tiles cover n·(D − o) + o, and the fewest tiles that cover L + 2p are
 *
 *     n = max(1, ⌈(L + 2p − o) / (D − o)⌉)
 *
 * Pages = columns × rows, each axis by the formula. The grid starts one padding before the piece
 * (at its left edge for columns, its top edge for rows), so the first page holds as much as it can.
 */

export interface TileAxis {
  count: number;
  /** Distance from one tile's start to the next: D − o. */
  stepMm: number;
  /** Piece coordinate where the first tile starts. */
  startMm: number;
}

/** The ceiling formula above. Throws when the drawing area is not longer than the overlap. */
export function tileCount(lengthMm: number, drawMm: number, overlapMm: number, padMm = 0): number {
  if (!(drawMm > overlapMm)) throw new RangeError(`the drawing area (${drawMm} mm) must be longer than the overlap (${overlapMm} mm)`);
  return Math.max(1, Math.ceil((lengthMm + 2 * padMm - overlapMm) / (drawMm - overlapMm) - 1e-9));
}

/** Tiles along one axis for the piece span [minMm, maxMm], starting `padMm` before `minMm`. */
export function tileAxis(minMm: number, maxMm: number, drawMm: number, overlapMm: number, padMm: number): TileAxis {
  const count = tileCount(maxMm - minMm, drawMm, overlapMm, padMm);
  return { count, stepMm: drawMm - overlapMm, startMm: minMm - padMm };
}

/** Row letters A…Z, then AA, AB… (spreadsheet style). */
export function rowLetter(index: number): string {
  let n = index + 1;
  let out = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

/** "B3": row letter, then the 1-based column number. */
export function tileLabel(row: number, col: number): string {
  return `${rowLetter(row)}${col + 1}`;
}
