import { inflateSync } from 'node:zlib';

/**
 * Unpacks a WOFF 1.0 font into the plain TrueType/OpenType (sfnt) font it wraps. pdfkit's fontkit can
 * read WOFF itself, but it inflates the tables in pure JavaScript: about 0.3 s per document for the
 * quote's fonts. Node's zlib does it once per process in milliseconds, and pdfkit reads the result
 * directly. Layout per the WOFF 1.0 specification (W3C), §3–5. Tables named in `dropTables` are left
 * out (the whole-font checksum in `head` is then stale; fontkit does not check it, and pdfkit embeds
 * its own subset of the font anyway).
 */
export function woffToSfnt(woff: Buffer, dropTables: readonly string[] = []): Buffer {
  if (woff.toString('latin1', 0, 4) !== 'wOFF') throw new Error('Not a WOFF 1.0 font');
  const flavor = woff.readUInt32BE(4);
  const stored = Array.from({ length: woff.readUInt16BE(12) }, (_, i) => {
    const entry = 44 + 20 * i;
    const offset = woff.readUInt32BE(entry + 4);
    const compLength = woff.readUInt32BE(entry + 8);
    const origLength = woff.readUInt32BE(entry + 12);
    return {
      tag: woff.subarray(entry, entry + 4),
      checksum: woff.readUInt32BE(entry + 16),
      compressed: compLength < origLength,
      bytes: woff.subarray(offset, offset + compLength),
    };
  });
  const tables = stored
    .filter((table) => !dropTables.includes(table.tag.toString('latin1')))
    .map((table) => ({
      ...table,
      data: table.compressed ? inflateSync(table.bytes) : table.bytes,
    }));
  const numTables = tables.length;

  // The sfnt offset table's binary-search fields: the largest power of two ≤ numTables.
  const entrySelector = Math.floor(Math.log2(numTables));
  const searchRange = 2 ** entrySelector * 16;
  const headerLength = 12 + 16 * numTables;
  const padded = (length: number) => (length + 3) & ~3;
  const total = tables.reduce((sum, table) => sum + padded(table.data.length), headerLength);
  const sfnt = Buffer.alloc(total);
  sfnt.writeUInt32BE(flavor, 0);
  sfnt.writeUInt16BE(numTables, 4);
  sfnt.writeUInt16BE(searchRange, 6);
  sfnt.writeUInt16BE(entrySelector, 8);
  sfnt.writeUInt16BE(numTables * 16 - searchRange, 10);
  let dataOffset = headerLength;
  tables.forEach((table, i) => {
    const record = 12 + 16 * i;
    table.tag.copy(sfnt, record);
    sfnt.writeUInt32BE(table.checksum, record + 4);
    sfnt.writeUInt32BE(dataOffset, record + 8);
    sfnt.writeUInt32BE(table.data.length, record + 12);
    table.data.copy(sfnt, dataOffset);
    dataOffset += padded(table.data.length);
  });
  return sfnt;
}
