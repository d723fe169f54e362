import { fromBufferPromise } from 'yauzl';
import { ZipFile } from 'yazl';

export interface ZipInput {
  name: string;
  bytes: Buffer;
  /** Deflate (the default) or store. */
  compress?: boolean;
}

/** A ZIP of the given entries, written by yazl. */
export function zipOf(entries: ZipInput[]): Promise<Buffer> {
  const zip = new ZipFile();
  for (const entry of entries) zip.addBuffer(entry.bytes, entry.name, { compress: entry.compress ?? true, mtime: new Date('2026-11-30T10:00:00Z') });
  zip.end();
  return collect(zip.outputStream);
}

/** Every entry of a ZIP, by name, read by yauzl. */
export async function unzip(bytes: Uint8Array): Promise<Map<string, Buffer>> {
  const zip = await fromBufferPromise(Buffer.from(bytes), { autoClose: false });
  const files = new Map<string, Buffer>();
  for await (const entry of zip.eachEntry()) files.set(entry.fileName, await collect(await zip.openReadStreamPromise(entry)));
  zip.close();
  return files;
}

async function collect(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Buffer));
  return Buffer.concat(chunks);
}

/*
 * Changing an archive after it was written, as a hostile one would be: offsets from PKWARE's
 * APPNOTE.TXT (6.3.10), 4.3.7 (local file header: signature 0x04034b50, uncompressed size at 22,
 * name length at 26, name at 30) and 4.3.12 (central directory header: signature 0x02014b50,
 * uncompressed size at 24, name length at 28, name at 46).
 */
const LOCAL = { signature: 0x04034b50, size: 22, nameLength: 26, name: 30 };
const CENTRAL = { signature: 0x02014b50, size: 24, nameLength: 28, name: 46 };

function headersNamed(zip: Buffer, name: string, layout: typeof LOCAL): number[] {
  const wanted = Buffer.from(name);
  const found: number[] = [];
  for (let at = 0; at + layout.name <= zip.length; at++) {
    if (zip.readUInt32LE(at) !== layout.signature || zip.readUInt16LE(at + layout.nameLength) !== wanted.length) continue;
    if (zip.subarray(at + layout.name, at + layout.name + wanted.length).equals(wanted)) found.push(at);
  }
  if (found.length === 0) throw new Error(`no header for ${name}`);
  return found;
}

/** Renames an entry in place (the new name has the same length), in its local header and the central directory. */
export function renameEntry(zip: Buffer, from: string, to: string): Buffer {
  if (Buffer.byteLength(from) !== Buffer.byteLength(to)) throw new Error('names must be of one length');
  const patched = Buffer.from(zip);
  for (const layout of [LOCAL, CENTRAL]) for (const at of headersNamed(zip, from, layout)) patched.write(to, at + layout.name);
  return patched;
}

/** Says another uncompressed size for an entry in the central directory (which is what readers go by). */
export function declareSize(zip: Buffer, name: string, size: number): Buffer {
  const patched = Buffer.from(zip);
  for (const at of headersNamed(zip, name, CENTRAL)) patched.writeUInt32LE(size, at + CENTRAL.size);
  return patched;
}

/**
 * A ZIP of `count` empty stored entries named f0, f1, ..., written directly (yazl takes about a
 * minute for 100,000): local headers (APPNOTE 4.3.7), the central directory (4.3.12), and since
 * the count passes 65,535, the ZIP64 end records (4.3.14, 4.3.15) before the classic one (4.3.16).
 */
export function zipOfEmptyEntries(count: number): Buffer {
  const names = Array.from({ length: count }, (_, i) => Buffer.from(`f${i}`));
  const localSize = names.reduce((sum, n) => sum + 30 + n.length, 0);
  const centralSize = names.reduce((sum, n) => sum + 46 + n.length, 0);
  const zip = Buffer.alloc(localSize + centralSize + 56 + 20 + 22);
  const offsets: number[] = [];
  let at = 0;
  for (const name of names) {
    offsets.push(at);
    zip.writeUInt32LE(0x04034b50, at);
    zip.writeUInt16LE(10, at + 4); // version needed: 1.0
    zip.writeUInt16LE(name.length, at + 26);
    name.copy(zip, at + 30);
    at += 30 + name.length;
  }
  const centralStart = at;
  names.forEach((name, i) => {
    zip.writeUInt32LE(0x02014b50, at);
    zip.writeUInt16LE(45, at + 4); // made by 4.5 (ZIP64)
    zip.writeUInt16LE(10, at + 6);
    zip.writeUInt16LE(name.length, at + 28);
    zip.writeUInt32LE(offsets[i]!, at + 42);
    name.copy(zip, at + 46);
    at += 46 + name.length;
  });
  const zip64End = at;
  zip.writeUInt32LE(0x06064b50, at);
  zip.writeBigUInt64LE(44n, at + 4); // size of the rest of this record
  zip.writeUInt16LE(45, at + 12);
  zip.writeUInt16LE(45, at + 14);
  zip.writeBigUInt64LE(BigInt(count), at + 24);
  zip.writeBigUInt64LE(BigInt(count), at + 32);
  zip.writeBigUInt64LE(BigInt(centralSize), at + 40);
  zip.writeBigUInt64LE(BigInt(centralStart), at + 48);
  at += 56;
  zip.writeUInt32LE(0x07064b50, at);
  zip.writeBigUInt64LE(BigInt(zip64End), at + 8);
  zip.writeUInt32LE(1, at + 16); // one disk
  at += 20;
  zip.writeUInt32LE(0x06054b50, at);
  zip.writeUInt16LE(0xffff, at + 8);
  zip.writeUInt16LE(0xffff, at + 10);
  zip.writeUInt32LE(0xffffffff, at + 12);
  zip.writeUInt32LE(0xffffffff, at + 16);
  return zip;
}
