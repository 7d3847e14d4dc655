import { inflateSync } from 'node:zlib';

export type QuoteLogo = { bytes: Buffer; contentType: 'image/png' | 'image/jpeg' };

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
/** A logo larger than this many pixels is not embedded: pdfkit would decode it whole in memory. */
const MAX_LOGO_PIXELS = 16_000_000;

/**
 * The logo's bytes when pdfkit can embed them safely, else null (the PDF then shows the company name
 * alone). pdfkit decodes a PNG with transparency in an asynchronous zlib callback that throws outside
 * any try/catch, so a damaged PNG would crash the process: its pixel data is inflated here first,
 * synchronously, where a failure is caught. A JPEG is embedded as it is, never decoded.
 */
export function embeddableLogo(logo: QuoteLogo | null): Buffer | null {
  if (!logo || logo.bytes.length === 0) return null;
  const { bytes } = logo;
  if (bytes.subarray(0, 8).equals(PNG_SIGNATURE)) return pngDecodes(bytes) ? bytes : null;
  if (bytes[0] === 0xff && bytes[1] === 0xd8) return bytes;
  return null;
}

function pngDecodes(bytes: Buffer): boolean {
  if (bytes.length < 33 || bytes.toString('latin1', 12, 16) !== 'IHDR') return false;
  const width = bytes.readUInt32BE(16);
  const height = bytes.readUInt32BE(20);
  if (width === 0 || height === 0 || width * height > MAX_LOGO_PIXELS) return false;
  const idat: Buffer[] = [];
  let offset = 8;
  while (offset + 8 <= bytes.length) {
    const length = bytes.readUInt32BE(offset);
    const type = bytes.toString('latin1', offset + 4, offset + 8);
    if (offset + 12 + length > bytes.length) return false;
    if (type === 'IDAT') idat.push(bytes.subarray(offset + 8, offset + 8 + length));
    if (type === 'IEND') break;
    offset += 12 + length;
  }
  if (idat.length === 0) return false;
  try {
    // 16-bit RGBA is at most 8 bytes a pixel, plus one filter byte a row.
    inflateSync(Buffer.concat(idat), { maxOutputLength: width * height * 8 + height });
    return true;
  } catch {
    return false;
  }
}
