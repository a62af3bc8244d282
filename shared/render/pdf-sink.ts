/**
 * The drawing calls the PDF exports need, as an interface the caller injects. shared/ never imports
 * pdfkit: the server implements this over pdfkit (server/export/pdfkit-sink.ts) and tests record the
 * calls with a fake.
 *
 * Units are PDF points (1 pt = 1/72 in, ISO 32000-1 §8.3.2.1). The origin is the top-left corner of
 * the page, y grows downwards (pdfkit's convention). Colours are `#rrggbb`.
 */

/** 1 mm in points: 72 / 25.4 (1 in = 25.4 mm exactly, 1959 agreement; 1 pt = 1/72 in, ISO 32000-1). */
export const PT_PER_MM = 72 / 25.4;

/** Fonts are chosen by name only; the sink maps each name to an embedded font file. */
export const FONT_NAMES = ['regular', 'bold'] as const;
export type FontName = (typeof FONT_NAMES)[number];

export interface PdfSink {
  /** Starts a new page; sizes in points. */
  addPage(widthPt: number, heightPt: number): void;
  save(): void;
  restore(): void;
  lineWidth(pt: number): void;
  strokeColor(color: string): void;
  fillColor(color: string): void;
  /** Dashed lines from now on: `onPt` drawn, `offPt` gap. */
  dash(onPt: number, offPt: number): void;
  undash(): void;
  moveTo(x: number, y: number): void;
  lineTo(x: number, y: number): void;
  closePath(): void;
  rect(x: number, y: number, widthPt: number, heightPt: number): void;
  circle(cx: number, cy: number, radiusPt: number): void;
  stroke(): void;
  fill(): void;
  fillAndStroke(): void;
  /** Clips everything drawn until the matching restore() to the current path. */
  clip(): void;
  /** One line of text, left-aligned at x, `yBaseline` on the alphabetic baseline, in the fill colour. */
  text(font: FontName, sizePt: number, x: number, yBaseline: number, text: string): void;
  /** Advance width of `text` in points. */
  textWidth(font: FontName, sizePt: number, text: string): number;
}
