import { openPromise, type Entry, type ZipFile } from 'yauzl';
import { AppError } from '../http/app-error.ts';

export interface ArchiveReadLimits {
  maxEntries: number;
  maxUnpackedBytes: number;
}

/** The entries of a ZIP that passed the checks of its central directory, read one at a time. */
export interface ArchiveEntries {
  names(): string[];
  has(name: string): boolean;
  /** The entry's bytes, counted while inflating: past `maxBytes`, its declared size or the archive's total, it is refused. */
  read(name: string, maxBytes: number): Promise<Buffer>;
  close(): void;
}

const quoted = (name: string) => JSON.stringify(name.length > 80 ? `${name.slice(0, 80)}...` : name);

export const notAZip = () => new AppError(400, 'NOT_A_ZIP', 'This file is not a ZIP archive. Choose the .zip file Canwright saved when you exported your library.');
const damaged = () => new AppError(400, 'ARCHIVE_DAMAGED', 'This ZIP archive is damaged or cut short, so nothing was imported. Export the library again and import the new file.');
const unsafeName = (name: string) =>
  new AppError(400, 'ARCHIVE_UNSAFE', `This archive holds a file named ${quoted(name)}, a name that points outside the archive. Canwright does not open such archives, so nothing was imported.`);
export const tooMuchUnpacked = (limit: number) =>
  new AppError(413, 'ARCHIVE_TOO_LARGE', `This archive unpacks to more than ${Math.round(limit / 1024 / 1024)} MB, more than a Canwright library can hold, so nothing was imported.`);

/**
 * Opens a ZIP on disk with yauzl and checks what its central directory says before any entry is
 * inflated (PKWARE APPNOTE.TXT 4.3.12 and 4.3.16): the entry count, every name (yauzl refuses
 * absolute paths, `..` segments and, with strictFileNames, backslashes; `accept` names the files
 * the caller takes), encryption, repeated names and the declared sizes. While an entry is read,
 * yauzl (validateEntrySizes) and this reader both count the real bytes: a ZIP can lie.
 */
export async function openArchive(path: string, limits: ArchiveReadLimits, accept: (name: string) => AppError | undefined): Promise<ArchiveEntries> {
  let zip: ZipFile;
  try {
    zip = await openPromise(path, { autoClose: false, strictFileNames: true, validateEntrySizes: true, decodeStrings: true });
  } catch {
    throw notAZip();
  }
  try {
    if (zip.entryCount > limits.maxEntries) {
      throw new AppError(413, 'ARCHIVE_TOO_MANY_FILES', `This archive holds ${zip.entryCount.toLocaleString('en')} files, more than the ${limits.maxEntries.toLocaleString('en')} a Canwright library can hold, so nothing was imported.`);
    }
    const entries = await listEntries(zip, limits, accept);
    let unpacked = 0;
    return {
      names: () => [...entries.keys()],
      has: (name) => entries.has(name),
      async read(name, maxBytes) {
        const entry = entries.get(name);
        if (!entry) throw new Error(`no entry ${name}`);
        const chunks: Buffer[] = [];
        let size = 0;
        try {
          const stream = await zip.openReadStreamPromise(entry);
          for await (const chunk of stream as AsyncIterable<Buffer>) {
            size += chunk.length;
            unpacked += chunk.length;
            if (unpacked > limits.maxUnpackedBytes) throw tooMuchUnpacked(limits.maxUnpackedBytes);
            if (size > maxBytes || size > entry.uncompressedSize) throw sizeLie(name);
            chunks.push(chunk);
          }
        } catch (error) {
          throw translate(error, name);
        }
        return Buffer.concat(chunks);
      },
      close: () => zip.close(),
    };
  } catch (error) {
    zip.close();
    throw error;
  }
}

async function listEntries(zip: ZipFile, limits: ArchiveReadLimits, accept: (name: string) => AppError | undefined): Promise<Map<string, Entry>> {
  const entries = new Map<string, Entry>();
  let declared = 0;
  const iterator = zip.eachEntry();
  for (;;) {
    let step: IteratorResult<Entry>;
    try {
      step = await iterator.next();
    } catch (error) {
      throw translate(error);
    }
    if (step.done) return entries;
    const entry = step.value;
    if (entry.fileName.endsWith('/')) continue; // a folder: nothing to read
    const refused = accept(entry.fileName);
    if (refused) throw refused;
    if (entry.isEncrypted()) throw new AppError(400, 'ARCHIVE_ENCRYPTED', 'This archive is protected by a password. Canwright writes archives without one; export the library again and import that file.');
    if (entries.has(entry.fileName)) throw new AppError(400, 'ARCHIVE_INVALID', `This archive holds ${quoted(entry.fileName)} twice, so it is not clear which to take. Nothing was imported.`);
    declared += entry.uncompressedSize;
    if (declared > limits.maxUnpackedBytes) throw tooMuchUnpacked(limits.maxUnpackedBytes);
    entries.set(entry.fileName, entry);
  }
}

const sizeLie = (name: string) => new AppError(413, 'ARCHIVE_TOO_LARGE', `The file ${quoted(name)} in this archive unpacks to more than it says or than Canwright takes, so nothing was imported.`);

/** yauzl's own errors, in the maker's words. */
function translate(error: unknown, entryName?: string): AppError {
  if (error instanceof AppError) return error;
  const message = (error as Error).message ?? '';
  const named = /^(invalid relative path|absolute path|invalid characters in fileName): (.*)$/s.exec(message);
  if (named) return unsafeName(named[2] ?? '');
  if (/too many bytes in the stream/.test(message)) return sizeLie(entryName ?? '');
  if (/strong encryption|is encrypted/.test(message)) return new AppError(400, 'ARCHIVE_ENCRYPTED', 'This archive is protected by a password. Canwright writes archives without one; export the library again and import that file.');
  if (/unsupported compression method/.test(message)) return new AppError(400, 'ARCHIVE_DAMAGED', 'This archive was packed in a way Canwright does not read. Import the .zip file Canwright saved when you exported your library.');
  return damaged();
}
