import { crc32, deflateSync } from 'node:zlib';
import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { splitIntoSubsetRuns } from './inter-fonts';
import { acceptedDemoQuoteView, demoQuoteView } from './quote-view.fixture';
import { renderQuotePdf } from './render-quote-pdf';

const generatedAt = new Date('2026-03-05T12:00:00.000Z');

// Text extracted with pdf-parse (pdf.js), a general-purpose PDF reader: the tests read what a PDF
// viewer shows, not what the renderer meant to write. Whitespace is collapsed, as line breaks depend
// on the layout.
async function readPdf(pdf: Buffer): Promise<{ text: string; pages: number }> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    const result = await parser.getText();
    return { text: result.text.replace(/\s+/g, ' '), pages: result.total };
  } finally {
    await parser.destroy();
  }
}

/**
 * A valid 3 × 2 RGBA PNG built by hand (signature, IHDR, one zlib IDAT, IEND; PNG spec §5), or with
 * `compressedPixels` in its IDAT instead.
 */
function tinyPng(compressedPixels?: Buffer): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(3, 0); // width
  header.writeUInt32BE(2, 4); // height
  header.set([8, 6, 0, 0, 0], 8); // 8 bits, RGBA, deflate, no filter method, not interlaced
  // Each row: filter byte 0, then three reed-green pixels, the last half transparent.
  const row = Buffer.from([0, 93, 112, 49, 255, 93, 112, 49, 255, 93, 112, 49, 128]);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', compressedPixels ?? deflateSync(Buffer.concat([row, row]))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

describe('renderQuotePdf', () => {
  it('writes a PDF a general reader opens, with the customer, number, total, options and safety', async () => {
    const quote = demoQuoteView();
    const pdf = await renderQuotePdf(quote, { logo: null, generatedAt });

    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const { text } = await readPdf(pdf);
    expect(text).toContain('Zofia Wiśniewska-Thorne');
    expect(text).toContain('27 Kingfisher Rise, Larchmere Vale');
    expect(text).toContain('Quote 1042 · version 3');
    expect(text).toContain('Issued Mar 4, 2026');
    expect(text).toContain('$14,593.50');
    expect(text).toContain('Includes a discount of $750.00');
    expect(text).toContain('Underwater lighting, three warm-white fixtures');
    expect(text).toContain('Alternate');
    expect(text).toContain('Safety');
    expect(text).toContain('Keep children and pets away from the open excavation.');
    // Deposit at 30 % of the base total: 0.30 × 14,593.50 = 4,378.05; balance 14,593.50 − 4,378.05.
    expect(text).toContain('Deposit on acceptance (30 %) $4,378.05');
    expect(text).toContain('Balance on completion $10,215.45');
    // The drawings' captions and dimension labels are text too.
    expect(text).toContain('Plan view');
    expect(text).toContain('Cross-section of basin 1 along its 16 ft length');
    expect(text).not.toContain('Accepted by');
  });

  it('prints the accepted total, deposit and balance of the options the homeowner chose', async () => {
    const pdf = await renderQuotePdf(acceptedDemoQuoteView(), { logo: null, generatedAt });
    const { text } = await readPdf(pdf);

    // Chosen: lighting 1,240.00 + tax 100.44 and river-stone edging 920.00 + tax 74.52.
    // Total = 14,593.50 + 1,240.00 + 100.44 + 920.00 + 74.52 = 16,928.46
    // Deposit = 30 % × 16,928.46 = 5,078.538 → 5,078.54 (half up); balance = 16,928.46 − 5,078.54 = 11,849.92
    expect(text).toContain('Options chosen, before tax $2,160.00');
    expect(text).toContain('Sales tax on options $174.96');
    expect(text).toContain('Accepted total $16,928.46');
    expect(text).toContain('Deposit on acceptance (30 %) $5,078.54');
    expect(text).toContain('Balance on completion $11,849.92');
    expect(text).toContain('Accepted by Zofia Wiśniewska-Thorne on Mar 9, 2026');
    expect(text).toContain('Deposit received Mar 10, 2026');
    expect(text.match(/Chosen /g)).toHaveLength(2);
  });

  it('flows a 60-paragraph scope over more pages, each with its page number and version hash', async () => {
    const paragraphs = Array.from(
      { length: 60 },
      (_, i) =>
        `Paragraph ${i + 1}. We set each boulder by hand on compacted soil, check the liner folds, and photograph the work before the next course of stone goes on, so that nothing is hidden that you have not seen.`,
    );
    const short = await readPdf(await renderQuotePdf(demoQuoteView(), { logo: null, generatedAt }));
    const long = await readPdf(
      await renderQuotePdf(demoQuoteView({ scope: paragraphs.join('\n\n') }), {
        logo: null,
        generatedAt,
      }),
    );

    expect(long.pages).toBeGreaterThan(1);
    expect(long.pages).toBeGreaterThan(short.pages);
    expect(long.text).toContain('Paragraph 60. We set each boulder');
    expect(long.text).toContain(`Page ${long.pages} of ${long.pages}`);
    const shortSha = demoQuoteView().estimate.contentSha256.slice(0, 12);
    expect(long.text.split(`SHA-256 ${shortSha}`)).toHaveLength(long.pages + 1);
  });

  it('embeds a PNG logo', async () => {
    const pdf = await renderQuotePdf(demoQuoteView(), {
      logo: { bytes: tinyPng(), contentType: 'image/png' },
      generatedAt,
    });

    const parser = new PDFParse({ data: new Uint8Array(pdf) });
    try {
      const images = await parser.getImage({ imageThreshold: 0, partial: [1] });
      expect(images.pages[0]?.images.map((image) => [image.width, image.height])).toEqual([[3, 2]]);
    } finally {
      await parser.destroy();
    }
  });

  it('leaves out a damaged logo and renders a quote without drawings, site, options or discount', async () => {
    // Well-formed chunks around pixel data that is not zlib: pdfkit alone would throw from an
    // asynchronous zlib callback and bring the process down.
    const damaged = tinyPng(Buffer.from('not zlib data'));
    const quote = demoQuoteView({
      estimate: { ...demoQuoteView().estimate, siteAddress: null },
      drawings: { plan: null, sections: [] },
      options: [],
      base: { priceBeforeTax: '13500.00', discount: '0.00', tax: '1093.50', total: '14593.50' },
      terms: [],
      cautions: [],
    });
    const pdf = await renderQuotePdf(quote, {
      logo: { bytes: damaged, contentType: 'image/png' },
      generatedAt,
    });
    const { text } = await readPdf(pdf);

    expect(text).toContain('Fernhollow Water Gardens');
    expect(text).toContain('Total $14,593.50');
    expect(text).not.toContain('Drawings');
    expect(text).not.toContain('Options');
    expect(text).not.toContain('discount');
    expect(text).not.toContain('Safety');
  });

  it('keeps words whole where the font changes inside them when a name wraps', async () => {
    const name = Array.from({ length: 6 }, () => 'Nguyễn Thị Hương').join(' ');
    const quote = demoQuoteView({ estimate: { ...demoQuoteView().estimate, customerName: name } });
    const { text } = await readPdf(await renderQuotePdf(quote, { logo: null, generatedAt }));

    expect(text).toContain(name);
  });

  it('writes each run of characters in an Inter subset that has them', () => {
    expect(splitIntoSubsetRuns('Łukasz O’Brien')).toEqual([
      { subset: 'latin-ext', text: 'Ł' },
      { subset: 'latin', text: 'ukasz O’Brien' },
    ]);
    expect(splitIntoSubsetRuns('Ngô Bảo')).toEqual([
      { subset: 'latin', text: 'Ngô B' },
      { subset: 'vietnamese', text: 'ả' },
      { subset: 'latin', text: 'o' },
    ]);
  });
});
