/**
 * Paper for stencils and cut diagrams. Sizes in mm:
 * ISO 216: A4 210 × 297, A3 297 × 420. ANSI (ASME Y14.1): Letter 8.5 × 11 in, Tabloid 11 × 17 in
 * (1 in = 25.4 mm). A roll (plotter paper) has a fixed width and a length cut to suit.
 */
export const SHEET_PAPERS = ['A4', 'Letter', 'A3', 'Tabloid'] as const;
export type SheetPaperName = (typeof SHEET_PAPERS)[number];

export const PAPER_SIZES_MM: Record<SheetPaperName, { widthMm: number; heightMm: number }> = {
  A4: { widthMm: 210, heightMm: 297 },
  A3: { widthMm: 297, heightMm: 420 },
  Letter: { widthMm: 8.5 * 25.4, heightMm: 11 * 25.4 },
  Tabloid: { widthMm: 11 * 25.4, heightMm: 17 * 25.4 },
};

export type Paper =
  | { kind: 'sheet'; name: SheetPaperName }
  /** A roll: fixed width; pages are cut to length, never longer than `maxLengthMm`. */
  | { kind: 'roll'; widthMm: number; maxLengthMm: number };

/** The short name used in file names and titles: "a4", "letter", "roll-610mm". */
export function paperSlug(paper: Paper): string {
  return paper.kind === 'sheet' ? paper.name.toLowerCase() : `roll-${Math.round(paper.widthMm)}mm`;
}

export function paperLabel(paper: Paper): string {
  return paper.kind === 'sheet' ? paper.name : `${Math.round(paper.widthMm)} mm roll`;
}
