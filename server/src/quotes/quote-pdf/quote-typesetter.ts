import {
  interFontFile,
  splitIntoSubsetRuns,
  type InterSubset,
  type InterWeight,
} from './inter-fonts';

export type TextStyle = { size: number; color: string; weight?: InterWeight };

/**
 * Writes text on a pdfkit document in Inter, switching between Inter's script subsets within a string
 * (see `inter-fonts`). Every piece of text in the quote PDF goes through `write`, so a name such as
 * "Zofia Wiśniewska" prints whole wherever it appears.
 */
export class QuoteTypesetter {
  private readonly registered = new Set<string>();
  private weight: InterWeight = 400;

  constructor(readonly doc: PDFKit.PDFDocument) {}

  /** Sets the size, colour and weight for the text that follows. */
  style({ size, color, weight = 400 }: TextStyle): this {
    this.weight = weight;
    this.useSubset('latin');
    this.doc.fontSize(size).fillColor(color);
    return this;
  }

  /**
   * Writes text with its top at (x, y), or where the last text ended when they are undefined. With
   * `width` (or by default) the text wraps at the right margin and flows onto new pages; with
   * `lineBreak: false` it stays on one line.
   */
  write(text: string, x?: number, y?: number, options: PDFKit.Mixins.TextOptions = {}): this {
    const runs = splitIntoSubsetRuns(text);
    if (runs.length <= 1) {
      this.useSubset(runs[0]?.subset ?? 'latin');
      this.doc.text(text, x, y, options);
      this.useSubset('latin');
    } else {
      this.writeMixed(text, x ?? this.doc.x, y ?? this.doc.y, options);
    }
    return this;
  }

  /** The width of one line of text in the current style, pt. */
  widthOf(text: string): number {
    let width = 0;
    for (const run of splitIntoSubsetRuns(text)) {
      this.useSubset(run.subset);
      width += this.doc.widthOfString(run.text);
    }
    this.useSubset('latin');
    return width;
  }

  /** The height the text takes when wrapped to `options.width`, pt, as `write` lays it out. */
  heightOf(text: string, options: PDFKit.Mixins.TextOptions): number {
    if (splitIntoSubsetRuns(text).length > 1) {
      const lines = this.wrapLines(text, options.width ?? Infinity);
      return lines.length * this.lineHeight(options.lineGap ?? 0);
    }
    this.useSubset('latin');
    return this.doc.heightOfString(text, options);
  }

  /** The height of one line in the current style, pt. */
  lineHeight(lineGap = 0): number {
    return this.doc.currentLineHeight(true) + lineGap;
  }

  /** The text, cut short with "…" if it is wider than `width`. */
  truncate(text: string, width: number): string {
    if (this.widthOf(text) <= width) return text;
    const characters = [...text];
    while (characters.length > 0 && this.widthOf(`${characters.join('').trimEnd()}…`) > width) {
      characters.pop();
    }
    return `${characters.join('').trimEnd()}…`;
  }

  /**
   * Text of several font runs, laid out line by line here: pdfkit's own wrapping treats each font run
   * as a separate piece and may break a line inside a word where the font changes ("Wi" | "śniewska"),
   * and it aligns each piece on its own. Words are kept whole; a word wider than the line is split.
   */
  private writeMixed(text: string, x: number, y: number, options: PDFKit.Mixins.TextOptions): void {
    const { doc } = this;
    const oneLine = options.lineBreak === false;
    const width = oneLine
      ? Infinity
      : (options.width ?? doc.page.width - x - doc.page.margins.right);
    const lineHeight = this.lineHeight(options.lineGap ?? 0);
    let top = y;
    for (const line of oneLine ? [text] : this.wrapLines(text, width)) {
      if (!oneLine && top + lineHeight > doc.page.height - doc.page.margins.bottom) {
        doc.addPage();
        top = doc.page.margins.top;
      }
      const spare = Number.isFinite(width) ? width - this.widthOf(line) : 0;
      let cursor =
        x + (options.align === 'right' ? spare : options.align === 'center' ? spare / 2 : 0);
      for (const run of splitIntoSubsetRuns(line)) {
        this.useSubset(run.subset);
        doc.text(run.text, cursor, top, { lineBreak: false });
        cursor += doc.widthOfString(run.text);
      }
      if (!oneLine) top += lineHeight;
    }
    this.useSubset('latin');
    doc.x = x;
    doc.y = top;
  }

  /** Greedy line breaking at spaces (and at line breaks in the text), measured run by run. */
  private wrapLines(text: string, width: number): string[] {
    const lines: string[] = [];
    for (const paragraph of text.split('\n')) {
      let line = '';
      for (const word of paragraph.split(/\s+/).filter((w) => w !== '')) {
        const candidate = line === '' ? word : `${line} ${word}`;
        if (this.widthOf(candidate) <= width) {
          line = candidate;
          continue;
        }
        if (line !== '') lines.push(line);
        line = '';
        for (const character of word) {
          if (line !== '' && this.widthOf(line + character) > width) {
            lines.push(line);
            line = '';
          }
          line += character;
        }
      }
      lines.push(line);
    }
    return lines;
  }

  private useSubset(subset: InterSubset): void {
    const name = `inter-${subset}-${this.weight}`;
    if (!this.registered.has(name)) {
      this.doc.registerFont(name, interFontFile(subset, this.weight));
      this.registered.add(name);
    }
    this.doc.font(name);
  }
}
