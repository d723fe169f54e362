import { inflateSync } from 'node:zlib';

/**
 * Unpacks a WOFF 1.0 font into the plain sfnt (TrueType/OpenType) file it was made from.
 * fontkit reads WOFF tables by inflating them on every access (the whole `glyf` table once per
 * glyph while subsetting, tens of ms a document); a plain sfnt is read in place, so the
 * subsetting pdf-lib does at save time takes about a millisecond.
 * Layout from the W3C WOFF File Format 1.0 (2012), sections 3-5, and the OpenType `sfnt` table
 * directory (ISO/IEC 14496-22, 4.5).
 */
export function convertWoffToSfnt(woff: Uint8Array): Uint8Array {
  const src = new DataView(woff.buffer, woff.byteOffset, woff.byteLength);
  // WOFF 1.0, 3: header is 44 bytes; signature 0x774F4646 ('wOFF').
  if (woff.byteLength < 44 || src.getUint32(0) !== 0x774f4646) throw new Error('Not a WOFF 1.0 font');
  const flavor = src.getUint32(4);
  const numTables = src.getUint16(12);

  const tables: { tag: number; checksum: number; data: Uint8Array }[] = [];
  for (let i = 0; i < numTables; i++) {
    // WOFF 1.0, 4: each directory entry is 20 bytes after the header.
    const at = 44 + i * 20;
    const offset = src.getUint32(at + 4);
    const compLength = src.getUint32(at + 8);
    const origLength = src.getUint32(at + 12);
    const stored = woff.subarray(offset, offset + compLength);
    // WOFF 1.0, 5: a table is zlib-compressed only when that made it smaller.
    const data = compLength < origLength ? new Uint8Array(inflateSync(stored)) : stored;
    if (data.byteLength !== origLength) throw new Error('WOFF table has the wrong length');
    tables.push({ tag: src.getUint32(at), checksum: src.getUint32(at + 16), data });
  }

  // OpenType: 12-byte offset table, 16-byte records, each table padded to 4 bytes.
  const pad4 = (n: number): number => (n + 3) & ~3;
  const headerSize = 12 + numTables * 16;
  const total = tables.reduce((sum, t) => sum + pad4(t.data.byteLength), headerSize);
  const out = new Uint8Array(total);
  const dst = new DataView(out.buffer);
  const entrySelector = Math.floor(Math.log2(numTables));
  const searchRange = 2 ** entrySelector * 16;
  dst.setUint32(0, flavor);
  dst.setUint16(4, numTables);
  dst.setUint16(6, searchRange);
  dst.setUint16(8, entrySelector);
  dst.setUint16(10, numTables * 16 - searchRange);

  let offset = headerSize;
  tables.forEach((table, i) => {
    const at = 12 + i * 16;
    dst.setUint32(at, table.tag);
    dst.setUint32(at + 4, table.checksum);
    dst.setUint32(at + 8, offset);
    dst.setUint32(at + 12, table.data.byteLength);
    out.set(table.data, offset);
    offset += pad4(table.data.byteLength);
  });
  return out;
}
