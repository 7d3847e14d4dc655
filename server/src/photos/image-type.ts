export type ImageType = 'image/jpeg' | 'image/png' | 'image/webp';

/**
 * The image type from the file's first bytes, never its name or declared type: JPEG's SOI marker
 * FF D8 FF (ITU-T T.81, B.1.1.2), the PNG signature (ISO/IEC 15948, 5.2), and WebP's RIFF container
 * with the form type "WEBP" (RFC 9649, 2.5). Anything else, an executable renamed .jpg included, is null.
 */
export function imageTypeOf(bytes: Buffer): ImageType | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) {
    return 'image/jpeg';
  }
  if (bytes.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) {
    return 'image/png';
  }
  if (
    bytes.length >= 12 &&
    bytes.subarray(0, 4).toString('latin1') === 'RIFF' &&
    bytes.subarray(8, 12).toString('latin1') === 'WEBP'
  ) {
    return 'image/webp';
  }
  return null;
}
