/**
 * Small hand-written plans and a layout for the render tests (literal values, invented; shaped like
 * the bookshelf of PRODUCT.md §9). Numbers are chosen to be easy to check by hand.
 */
import type { LiningPiecePlan, PanelHole, PanelPlan, Point } from '../../../shared/schemas/plan.types.js';
import type { Layout } from '../../../shared/schemas/nest.schema.js';
import type { BuildCabinet, CutPart } from '../../../shared/render/build.js';
import type { StockInfo } from '../../../shared/render/cut-list.js';

export function circle(cx: number, cy: number, d: number, n = 64): Point[] {
  return Array.from({ length: n }, (_, i): Point => [cx + (d / 2) * Math.cos((2 * Math.PI * i) / n), cy + (d / 2) * Math.sin((2 * Math.PI * i) / n)]);
}

export const rectOutline = (w: number, h: number): Point[] => [
  [0, 0],
  [w, 0],
  [w, h],
  [0, h],
];

function piece(name: string, face: LiningPiecePlan['face'], outline: Point[], holes: Point[][] = [], quantity = 1): LiningPiecePlan {
  const xs = outline.map((p) => p[0]);
  const ys = outline.map((p) => p[1]);
  return {
    name,
    face,
    width: Math.max(...xs) - Math.min(...xs),
    height: Math.max(...ys) - Math.min(...ys),
    quantity,
    outline,
    holes,
    area: 0,
    thickness: 50,
  };
}

/** Back lining with a round hole for a rear port (Ø 56 tube + 2 × 5 mm clearance = Ø 66). */
export const BACK_LOWER = piece('Back lining (lower)', 'back', rectOutline(189, 193), [circle(94.5, 74.5, 66)]);
/** A side piece with a 30 × 40 notch in its top-right corner (a hole crossing the edge). */
export const LEFT_NOTCHED = piece('Left side lining (lower)', 'left', [
  [0, 0],
  [179, 0],
  [179, 153],
  [149, 153],
  [149, 193],
  [0, 193],
]);
export const TOP = piece('Top lining', 'top', rectOutline(89, 179));
/** Large enough to need several A4 pages in both directions. */
export const TALL = piece('Back lining (tall)', 'back', rectOutline(420, 930), [circle(210, 150, 86), [[180, 600], [240, 600], [240, 660], [180, 660]]], 1);

const round = (x: number, y: number, diameter: number, operation: 'through' | 'rebate', source: string, extra: Partial<PanelHole> = {}): PanelHole =>
  ({ shape: 'round', x, y, diameter, operation, source, ...extra }) as PanelHole;

/** Front baffle 220 × 360 with a Ø 118 woofer (rebate Ø 134 × 5, 4 screws Ø 4 on Ø 126) and a Ø 75 tweeter (rebate Ø 104 × 4). */
export const FRONT: PanelPlan = {
  name: 'Front (baffle)',
  role: 'front',
  width: 220,
  height: 360,
  thickness: 18,
  quantity: 1,
  grain: 'height',
  holes: [
    round(110, 135, 118, 'through', 'driver', { ref: 'openings[0]' }),
    round(110, 135, 134, 'rebate', 'driver', { ref: 'openings[0]', depth: 5 }),
    ...[0, 1, 2, 3].map((i) =>
      round(110 + 63 * Math.cos((Math.PI / 4) * (2 * i + 1)), 135 + 63 * Math.sin((Math.PI / 4) * (2 * i + 1)), 4, 'through', 'screw', { ref: 'openings[0]' }),
    ),
    round(110, 285, 75, 'through', 'driver', { ref: 'openings[1]' }),
    round(110, 285, 104, 'rebate', 'driver', { ref: 'openings[1]', depth: 4 }),
  ],
};

export const BACK: PanelPlan = {
  name: 'Back',
  role: 'back',
  width: 220,
  height: 360,
  thickness: 18,
  quantity: 1,
  grain: 'height',
  holes: [
    round(110, 90, 56, 'through', 'port'),
    { shape: 'rect', x: 110, y: 290, width: 60, height: 60, operation: 'through', source: 'terminal' },
  ],
};

export const SIDE: PanelPlan = { name: 'Left side', role: 'left', width: 224, height: 360, thickness: 18, quantity: 1, grain: 'height', holes: [] };

export const BOOKSHELF_CABINET: BuildCabinet = {
  name: 'Harbour bookshelf',
  count: 2,
  plan: { panels: [FRONT, BACK, SIDE], liningPieces: [BACK_LOWER, LEFT_NOTCHED, TOP] },
};

/** A hand-made guillotine layout of the panels above on one 2440 × 1220 sheet, kerf 4. */
export const SMALL_LAYOUT: Layout = {
  sheets: [
    {
      stockId: 'mdf18',
      kind: 'sheet',
      width: 2440,
      height: 1220,
      placements: [
        { partId: 'front', x: 0, y: 0, width: 220, height: 360, rotated: false },
        { partId: 'front', x: 224, y: 0, width: 220, height: 360, rotated: false },
        { partId: 'back', x: 448, y: 0, width: 220, height: 360, rotated: false },
        { partId: 'side', x: 0, y: 364, width: 224, height: 360, rotated: false },
        { partId: 'side', x: 228, y: 364, width: 360, height: 224, rotated: true },
      ],
      cuts: [
        { order: 1, kind: 'rip', x1: 0, y1: 362, x2: 2440, y2: 362 },
        { order: 2, kind: 'cross', x1: 222, y1: 0, x2: 222, y2: 362 },
        { order: 3, kind: 'cross', x1: 446, y1: 0, x2: 446, y2: 362 },
        { order: 4, kind: 'cross', x1: 670, y1: 0, x2: 670, y2: 362 },
        { order: 5, kind: 'rip', x1: 0, y1: 726, x2: 2440, y2: 726 },
        { order: 6, kind: 'cross', x1: 226, y1: 364, x2: 226, y2: 726 },
        { order: 7, kind: 'cross', x1: 590, y1: 364, x2: 590, y2: 726 },
      ],
      offcuts: [
        { x: 0, y: 728, width: 2440, height: 492 },
        { x: 672, y: 0, width: 1768, height: 362 },
      ],
    },
    {
      stockId: 'batt1200',
      kind: 'roll',
      width: 1200,
      height: 400,
      placements: [
        { partId: 'backLining', x: 0, y: 0, width: 189, height: 193, rotated: false },
        { partId: 'top', x: 193, y: 0, width: 89, height: 179, rotated: false },
      ],
      cuts: [],
    },
  ],
  unplaced: [],
  stats: { sheetsUsed: 1, utilisation: 0.2, elapsedMs: 3 },
};

/** The parts list of SMALL_LAYOUT. */
export const SMALL_PARTS: CutPart[] = [
  { id: 'front', kind: 'panel', name: 'Front (baffle)', cabinet: 'Harbour bookshelf', widthMm: 220, heightMm: 360, thicknessMm: 18, quantity: 2, grain: 'height', material: 'MDF' },
  { id: 'back', kind: 'panel', name: 'Back', cabinet: 'Harbour bookshelf', widthMm: 220, heightMm: 360, thicknessMm: 18, quantity: 1, grain: 'height', material: 'MDF' },
  { id: 'side', kind: 'panel', name: 'Left side', cabinet: 'Harbour bookshelf', widthMm: 224, heightMm: 360, thicknessMm: 18, quantity: 2, grain: 'none', material: 'MDF' },
  { id: 'backLining', kind: 'lining', name: 'Back lining 1', cabinet: 'Harbour bookshelf', widthMm: 189, heightMm: 193, thicknessMm: 50, quantity: 1, grain: 'none', material: 'polyester batt' },
  { id: 'top', kind: 'lining', name: 'Top lining', cabinet: 'Harbour bookshelf', widthMm: 89, heightMm: 179, thicknessMm: 50, quantity: 1, grain: 'none', material: 'polyester batt' },
];

/** Stock of SMALL_LAYOUT: an MDF sheet at 38.50 each and a batt roll at 6.20 per metre. */
export const SMALL_STOCK: StockInfo[] = [
  { id: 'mdf18', kind: 'sheet', cost: 38.5, trim: 10, material: 'MDF', thickness: 18, grain: 'none' },
  { id: 'batt1200', kind: 'roll', cost: 6.2, material: 'polyester batt', thickness: 50 },
];
