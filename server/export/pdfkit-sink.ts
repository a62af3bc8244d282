/**
 * The PdfSink of shared/render over pdfkit. Fonts come from fonts/ (DejaVu Sans, regular and bold) and
 * are embedded (subset) in the PDF. Pages are created with no margin, so nothing pdfkit does on its own
 * (line wrapping, automatic page breaks) moves what shared/render draws.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import PDFDocument from 'pdfkit';
import type { FontName, PdfSink } from '../../shared/render/pdf-sink.js';

const FONT_FILES: Record<FontName, string> = {
  regular: fileURLToPath(new URL('../../fonts/DejaVuSans.ttf', import.meta.url)),
  bold: fileURLToPath(new URL('../../fonts/DejaVuSans-Bold.ttf', import.meta.url)),
};

/** Font files are read once per process and shared by every document. */
let fontBytes: Record<FontName, Buffer> | null = null;
function fonts(): Record<FontName, Buffer> {
  fontBytes ??= { regular: readFileSync(FONT_FILES.regular), bold: readFileSync(FONT_FILES.bold) };
  return fontBytes;
}

export interface PdfkitSinkOptions {
  title?: string;
  subject?: string;
  /** Fixed creation date (for reproducible output); pdfkit uses the current time otherwise. */
  creationDate?: Date;
}

export class PdfkitSink implements PdfSink {
  readonly doc: PDFKit.PDFDocument;
  private readonly chunks: Buffer[] = [];
  private readonly ended: Promise<Buffer>;

  constructor(options: PdfkitSinkOptions = {}) {
    this.doc = new PDFDocument({
      autoFirstPage: false,
      margin: 0,
      info: {
        Title: options.title ?? 'Boxwright export',
        Subject: options.subject ?? '',
        Creator: 'Boxwright',
        Producer: 'Boxwright',
        ...(options.creationDate ? { CreationDate: options.creationDate } : {}),
      },
      lang: 'en',
    });
    for (const [name, bytes] of Object.entries(fonts())) this.doc.registerFont(name, bytes);
    this.doc.on('data', (c: Buffer) => this.chunks.push(c));
    this.ended = new Promise((resolve, reject) => {
      this.doc.on('end', () => resolve(Buffer.concat(this.chunks)));
      this.doc.on('error', reject);
    });
  }

  addPage(widthPt: number, heightPt: number): void {
    this.doc.addPage({ size: [widthPt, heightPt], margin: 0 });
  }
  save(): void {
    this.doc.save();
  }
  restore(): void {
    this.doc.restore();
  }
  lineWidth(pt: number): void {
    this.doc.lineWidth(pt);
  }
  strokeColor(color: string): void {
    this.doc.strokeColor(color);
  }
  fillColor(color: string): void {
    this.doc.fillColor(color);
  }
  dash(onPt: number, offPt: number): void {
    this.doc.dash(onPt, { space: offPt });
  }
  undash(): void {
    this.doc.undash();
  }
  moveTo(x: number, y: number): void {
    this.doc.moveTo(x, y);
  }
  lineTo(x: number, y: number): void {
    this.doc.lineTo(x, y);
  }
  closePath(): void {
    this.doc.closePath();
  }
  rect(x: number, y: number, widthPt: number, heightPt: number): void {
    this.doc.rect(x, y, widthPt, heightPt);
  }
  circle(cx: number, cy: number, radiusPt: number): void {
    this.doc.circle(cx, cy, radiusPt);
  }
  stroke(): void {
    this.doc.stroke();
  }
  fill(): void {
    this.doc.fill();
  }
  fillAndStroke(): void {
    this.doc.fillAndStroke();
  }
  clip(): void {
    this.doc.clip();
  }
  text(font: FontName, sizePt: number, x: number, yBaseline: number, value: string): void {
    this.doc.font(font).fontSize(sizePt).text(value, x, yBaseline, { lineBreak: false, baseline: 'alphabetic' });
  }
  textWidth(font: FontName, sizePt: number, value: string): number {
    return this.doc.font(font).fontSize(sizePt).widthOfString(value);
  }

  /** Ends the document and resolves with the whole PDF. */
  finish(): Promise<Buffer> {
    this.doc.end();
    return this.ended;
  }
}
