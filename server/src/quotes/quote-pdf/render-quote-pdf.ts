import type { QuoteView } from '@pondwright/shared';
import PDFDocument from 'pdfkit';
import { embeddableLogo, type QuoteLogo } from './logo-image';
import { formatDate, scopeParagraphs, shortSha256 } from './pdf-format';
import { LEFT, paragraphs, sectionHeading } from './pdf-layout';
import { COLORS, CONTENT_WIDTH, PAGE, TYPE } from './pdf-theme';
import { drawQuoteDrawings } from './quote-pdf-drawings';
import { drawQuoteHeader, drawStatusNotice, quoteReference } from './quote-pdf-header';
import { drawQuotePrices } from './quote-pdf-prices';
import { drawBulletSection, drawHighlights, drawSafetyBox } from './quote-pdf-text-sections';
import { QuoteTypesetter } from './quote-typesetter';

export type RenderQuotePdfOptions = {
  /** The company's logo, or null to show the company name alone. A damaged image is left out. */
  logo: QuoteLogo | null;
  /** When the PDF is made: the document's creation date and the footer's "Generated" date. */
  generatedAt?: Date;
};

/**
 * The homeowner's quote as a Letter-size PDF: the same content as the public quote page (company,
 * title, customer and dates, scope, highlights, what is included, the plan and first cross-section,
 * prices and options, payment schedule, terms and safety), with the homeowner's choices once accepted.
 * Every page's footer gives "Page n of m" and the version's short SHA-256, so a printout can be
 * matched to the version it shows. Dates are read in UTC.
 */
export function renderQuotePdf(quote: QuoteView, options: RenderQuotePdfOptions): Promise<Buffer> {
  const generatedAt = options.generatedAt ?? new Date();
  const doc = new PDFDocument({
    size: PAGE.size,
    margins: PAGE.margins,
    // Pages are kept until the end so each footer can say how many pages there are.
    bufferPages: true,
    lang: 'en-US',
    displayTitle: true,
    info: {
      Title: `${quoteReference(quote)}: ${quote.estimate.title}`,
      Author: quote.company.name,
      Subject: `Quote for ${quote.estimate.customerName}`,
      Creator: 'Pondwright',
      CreationDate: generatedAt,
    },
  });
  const pdf = collect(doc);
  const t = new QuoteTypesetter(doc);

  drawQuoteHeader(t, quote, placeableLogo(doc, options.logo));
  drawStatusNotice(t, quote);
  const scope = scopeParagraphs(quote.scope);
  if (scope.length > 0) {
    sectionHeading(t, 'Scope of work');
    paragraphs(t, scope);
  }
  drawHighlights(t, quote.highlights);
  drawBulletSection(t, 'What is included', quote.included);
  drawQuoteDrawings(t, quote.drawings);
  drawQuotePrices(t, quote);
  drawBulletSection(t, 'Terms', quote.terms);
  drawSafetyBox(t, quote.cautions);
  drawFooters(t, quote, generatedAt);
  doc.end();
  return pdf;
}

/** The document's bytes once pdfkit has written them all. */
function collect(doc: PDFKit.PDFDocument): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
}

/** The logo when pdfkit can read it; a logo it cannot read is left out rather than failing the PDF. */
function placeableLogo(doc: PDFKit.PDFDocument, logo: QuoteLogo | null): Buffer | null {
  const bytes = embeddableLogo(logo);
  if (!bytes) return null;
  try {
    // pdfkit reads the image's header when it is opened (not typed in @types/pdfkit); failing here
    // leaves the logo out instead of failing while the page header is drawn.
    (doc as unknown as { openImage: (src: Buffer) => unknown }).openImage(bytes);
    return bytes;
  } catch {
    return null;
  }
}

/** "Page n of m" and the version's reference on every page, in the bottom margin. */
function drawFooters(t: QuoteTypesetter, quote: QuoteView, generatedAt: Date): void {
  const { doc } = t;
  const { start, count } = doc.bufferedPageRange();
  const reference = `${quoteReference(quote)} · SHA-256 ${shortSha256(quote.estimate.contentSha256)}`;
  const generated = `Generated ${formatDate(generatedAt.toISOString())} · ${quote.company.name}`;
  for (let index = start; index < start + count; index++) {
    doc.switchToPage(index);
    // Text below the bottom margin would otherwise make pdfkit start a new page.
    const bottomMargin = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    const ruleY = doc.page.height - bottomMargin + 22;
    doc
      .moveTo(LEFT, ruleY)
      .lineTo(LEFT + CONTENT_WIDTH, ruleY)
      .lineWidth(0.5)
      .strokeColor(COLORS.rule)
      .stroke();
    const pageLabel = `Page ${index - start + 1} of ${count}`;
    t.style({ size: TYPE.footer, color: COLORS.muted });
    t.write(reference, LEFT, ruleY + 6, { lineBreak: false });
    t.style({ size: TYPE.footer, color: COLORS.muted });
    t.write(t.truncate(generated, CONTENT_WIDTH), LEFT, ruleY + 16, { lineBreak: false });
    t.style({ size: TYPE.footer, color: COLORS.muted, weight: 600 });
    t.write(pageLabel, LEFT + CONTENT_WIDTH - t.widthOf(pageLabel), ruleY + 6, {
      lineBreak: false,
    });
    doc.page.margins.bottom = bottomMargin;
  }
}
