import type { Readable } from 'node:stream';
import type { Account } from '../../shared/account/account.ts';
import { archiveFileName, archiveFileNames, archivePhotoExtension, LIBRARY_ARCHIVE_FORMAT, LIBRARY_ARCHIVE_SCHEMA_VERSION, type ArchiveCounts, type Manifest } from '../../shared/archive/archive-format.ts';
import { preferenceKeys, type ArchivedBurn, type ArchivedDesign, type ArchivedPhoto, type ArchivedPrinterProfile } from '../../shared/archive/archive-schemas.ts';
import { burnFieldsSchema, type BurnFields } from '../../shared/burns/burn-schema.ts';
import type { ObjectStore } from '../storage/object-store.ts';
import type { ArchiveRepository } from './archive-repository.ts';
import { writeArchive, type LazyArchiveFile } from './write-archive.ts';

type Library = Awaited<ReturnType<ArchiveRepository['readLibrary']>>;

export interface LibraryExport {
  fileName: string;
  counts: ArchiveCounts;
  /** The ZIP, written as it is read; photos are fetched from the store one at a time. */
  stream: Readable;
}

const burnFieldNames = Object.keys(burnFieldsSchema.shape) as (keyof BurnFields)[];
const json = (value: unknown) => Buffer.from(`${JSON.stringify(value, null, 2)}\n`);
const iso = (date: Date) => date.toISOString();

/** The signed-in maker's whole library as one ZIP (the layout is in shared/archive/archive-format.ts). */
export function createLibraryExport(deps: { archives: ArchiveRepository; store: ObjectStore; getAccount: (userId: string) => Promise<Account>; writtenBy: string }) {
  return {
    async exportLibrary(ownerId: string, now = new Date()): Promise<LibraryExport> {
      const library = await deps.archives.readLibrary(ownerId);
      const account = await deps.getAccount(ownerId);
      const keys = new Map(library.designs.map((design, index) => [design.id, `d${index + 1}`]));
      const designs = archivedDesigns(library, keys);
      const { burns, photoFiles } = archivedBurns(library, keys, deps.store);
      const profiles: ArchivedPrinterProfile[] = library.profiles.map((p) => ({ name: p.name, measuredXMm: p.measuredXMm, measuredYMm: p.measuredYMm, isDefault: p.isDefault, createdAt: iso(p.createdAt) }));
      const preferences = Object.fromEntries(preferenceKeys.map((key) => [key, account[key]]));
      const counts: ArchiveCounts = { designs: designs.length, versions: library.versions.length, burns: burns.length, photos: library.photos.length, printerProfiles: profiles.length };
      const manifest: Manifest = { format: LIBRARY_ARCHIVE_FORMAT, schemaVersion: LIBRARY_ARCHIVE_SCHEMA_VERSION, exportedAt: iso(now), writtenBy: deps.writtenBy, counts };
      const files = [
        { name: archiveFileNames.manifest, bytes: json(manifest) },
        { name: archiveFileNames.designs, bytes: json({ designs }) },
        { name: archiveFileNames.burns, bytes: json({ burns }) },
        { name: archiveFileNames.printerProfiles, bytes: json({ profiles }) },
        { name: archiveFileNames.preferences, bytes: json({ preferences }) },
      ];
      return { fileName: archiveFileName(now), counts, stream: writeArchive(files, photoFiles, now) };
    },
  };
}

export type LibraryExporter = ReturnType<typeof createLibraryExport>;

function archivedDesigns(library: Library, keys: Map<string, string>): ArchivedDesign[] {
  return library.designs.map((design) => ({
    key: keys.get(design.id)!,
    name: design.name,
    tags: design.tags,
    createdAt: iso(design.createdAt),
    updatedAt: iso(design.updatedAt),
    lastPrintedAt: design.lastPrintedAt ? iso(design.lastPrintedAt) : null,
    versions: library.versions.filter((v) => v.designId === design.id).map((v) => ({ number: v.number, note: v.note, createdAt: iso(v.createdAt), document: v.document })),
  }));
}

/** Burns with their photos named photos/<burn>-<photo>.jpg (and -thumb), counted from 1 in the order written. */
function archivedBurns(library: Library, keys: Map<string, string>, store: ObjectStore): { burns: ArchivedBurn[]; photoFiles: LazyArchiveFile[] } {
  const photoFiles: LazyArchiveFile[] = [];
  const fromStore = (key: string) => async () => {
    const bytes = await store.get(key);
    if (!bytes) throw new Error(`stored file ${key} is missing`);
    return bytes;
  };
  const burns = library.burns.map(({ burn, version }, b) => {
    const photos = library.photos
      .filter((p) => p.burnId === burn.id)
      .map((photo, p): ArchivedPhoto => {
        const extension = archivePhotoExtension[photo.contentType as ArchivedPhoto['contentType']];
        const image = `photos/${b + 1}-${p + 1}.${extension}`;
        const thumbnail = `photos/${b + 1}-${p + 1}-thumb.${extension}`;
        photoFiles.push({ name: image, read: fromStore(photo.imageKey) }, { name: thumbnail, read: fromStore(photo.thumbnailKey) });
        return { image, thumbnail, contentType: photo.contentType as ArchivedPhoto['contentType'], width: photo.width, height: photo.height, createdAt: iso(photo.createdAt) };
      });
    const fields = Object.fromEntries(burnFieldNames.map((name) => [name, burn[name]])) as BurnFields;
    return { design: keys.get(burn.designId)!, version, date: iso(burn.burnedAt), ...fields, createdAt: iso(burn.createdAt), updatedAt: iso(burn.updatedAt), photos };
  });
  return { burns, photoFiles };
}
