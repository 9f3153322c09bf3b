/**
 * A thin layer over pdfkit for the package: the fonts registered, text with Greek runs, headings,
 * key-value tables and a cursor that starts a new page when a block would not fit.
 */
import PDFDocument from 'pdfkit';
import { FONT, fontBuffers, textRuns } from './pdf-fonts';

export const PAGE = { width: 612, height: 792, left: 54, right: 54, top: 72, bottom: 86 };
export const CONTENT_WIDTH = PAGE.width - PAGE.left - PAGE.right;
export const INK = '#1f2328';
export const MUTED = '#57606a';
export const RULE = '#d0d7de';

export interface TextOptions {
  size?: number;
  bold?: boolean;
  mono?: boolean;
  color?: string;
  width?: number;
  align?: 'left' | 'right' | 'center';
  lineGap?: number;
}

export class PdfWriter {
  readonly doc: PDFKit.PDFDocument;

  constructor(info: PDFKit.DocumentInfo) {
    this.doc = new PDFDocument({
      size: 'LETTER',
      margins: { top: PAGE.top, bottom: PAGE.bottom, left: PAGE.left, right: PAGE.right },
      bufferPages: true,
      compress: true,
      info,
      lang: 'en-US',
    });
    for (const [name, bytes] of fontBuffers()) this.doc.registerFont(name, bytes);
    this.doc.font(FONT.sans).fontSize(10).fillColor(INK);
  }

  get bottom(): number {
    return PAGE.height - PAGE.bottom;
  }

  /** Starts a new page unless `height` points still fit below the cursor. */
  ensure(height: number): void {
    if (this.doc.y + height > this.bottom) this.doc.addPage();
  }

  private base(o: TextOptions): string {
    return o.mono ? FONT.mono : o.bold ? FONT.sansBold : FONT.sans;
  }

  /** Height the text takes in `width` (Greek letters measured in the Latin font: close enough). */
  height(text: string, o: TextOptions = {}): number {
    this.doc.font(this.base(o)).fontSize(o.size ?? 10);
    return this.doc.heightOfString(text, { width: o.width ?? CONTENT_WIDTH, lineGap: o.lineGap ?? 1 });
  }

  /** Writes text at (x, y) or at the cursor, switching to the Greek font for Greek runs. */
  text(text: string, o: TextOptions = {}, x?: number, y?: number): void {
    const runs = textRuns(text);
    const size = o.size ?? 10;
    const base = this.base(o);
    this.doc.fillColor(o.color ?? INK).fontSize(size);
    runs.forEach((run, i) => {
      const opts: PDFKit.Mixins.TextOptions = {
        width: o.width ?? CONTENT_WIDTH,
        align: o.align ?? 'left',
        lineGap: o.lineGap ?? 1,
        continued: i < runs.length - 1,
      };
      this.doc.font(run.greek ? FONT.greek : base);
      if (i === 0 && x !== undefined) this.doc.text(run.text, x, y, opts);
      else this.doc.text(run.text, opts);
    });
    if (runs.length === 0) this.doc.text('', x, y);
    this.doc.fillColor(INK);
  }

  /** A paragraph at the left margin, moving to a new page first if it would not fit. */
  para(text: string, o: TextOptions = {}): void {
    this.ensure(this.height(text, o));
    this.text(text, o, PAGE.left);
    this.doc.moveDown(0.3);
  }

  heading(text: string, level: 1 | 2 = 1): void {
    const size = level === 1 ? 15 : 11.5;
    this.ensure(level === 1 ? 120 : 60);
    this.doc.moveDown(level === 1 ? 0.6 : 0.4);
    this.text(text, { size, bold: true }, PAGE.left);
    if (level === 1) {
      const y = this.doc.y + 2;
      this.doc
        .moveTo(PAGE.left, y)
        .lineTo(PAGE.width - PAGE.right, y)
        .lineWidth(0.6)
        .strokeColor(RULE)
        .stroke();
      this.doc.y = y + 6;
    } else this.doc.moveDown(0.2);
  }

  /** Rows of cells in columns of the given widths; a row never splits across pages. */
  table(
    rows: readonly (readonly string[])[],
    widths: readonly number[],
    o: { header?: boolean; size?: number } = {},
  ): void {
    const size = o.size ?? 9;
    rows.forEach((row, r) => {
      const bold = o.header === true && r === 0;
      const h =
        Math.max(...row.map((cell, c) => this.height(cell, { size, bold, width: widths[c] - 6 }))) + 4;
      this.ensure(h + 2);
      const y = this.doc.y;
      let x = PAGE.left;
      row.forEach((cell, c) => {
        this.text(cell, { size, bold, width: widths[c] - 6 }, x, y + 2);
        x += widths[c];
      });
      const end = y + h;
      this.doc
        .moveTo(PAGE.left, end)
        .lineTo(PAGE.left + widths.reduce((a, b) => a + b, 0), end)
        .lineWidth(0.3)
        .strokeColor(RULE)
        .stroke();
      this.doc.x = PAGE.left;
      this.doc.y = end + 1;
    });
    this.doc.moveDown(0.4);
  }

  /** The finished document as bytes. */
  finish(): Promise<Buffer> {
    const chunks: Buffer[] = [];
    return new Promise((resolve, reject) => {
      this.doc.on('data', (c: Buffer) => chunks.push(c));
      this.doc.on('end', () => resolve(Buffer.concat(chunks)));
      this.doc.on('error', reject);
      this.doc.end();
    });
  }
}
