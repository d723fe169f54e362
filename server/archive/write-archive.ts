import { Readable } from 'node:stream';
import { ZipFile } from 'yazl';

export interface ArchiveFile {
  name: string;
  bytes: Buffer;
}

export interface LazyArchiveFile {
  name: string;
  /** Read only when the ZIP writer reaches this entry, so a large library is never all in memory. */
  read(): Promise<Uint8Array>;
}

/**
 * A ZIP written by yazl as a stream: the JSON files deflated, the photos stored as they are
 * (JPEG and WebP are compressed already; deflating them again only costs time). An error while
 * reading a photo ends the stream with that error.
 */
export function writeArchive(files: ArchiveFile[], photos: LazyArchiveFile[], mtime: Date): Readable {
  const zip = new ZipFile();
  const output = zip.outputStream as Readable;
  zip.on('error', (error: Error) => output.destroy(error));
  for (const file of files) zip.addBuffer(file.bytes, file.name, { mtime, compress: true });
  for (const photo of photos) {
    zip.addReadStreamLazy(photo.name, { mtime, compress: false }, (callback) => {
      photo.read().then(
        (bytes) => callback(null, Readable.from([Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength)])),
        (error: Error) => callback(error, undefined as never),
      );
    });
  }
  zip.end();
  return output;
}
