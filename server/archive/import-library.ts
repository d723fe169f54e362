import { randomUUID } from 'node:crypto';
import { archiveLimits, archivePhotoExtension, type ImportSummary } from '../../shared/archive/archive-format.ts';
import { MAX_PHOTO_BYTES } from '../../shared/burns/burn-schema.ts';
import { AppError } from '../http/app-error.ts';
import { MAX_DESIGNS } from '../library/design-use-cases.ts';
import { MAX_VERSIONS } from '../library/design-version-use-cases.ts';
import { MAX_PRINTER_PROFILES } from '../printer-profiles/printer-profile-use-cases.ts';
import type { ObjectStore } from '../storage/object-store.ts';
import type { ArchiveRepository, ExistingLibrary, ImportRows } from './archive-repository.ts';
import { checkArchivedPhoto } from './check-photo.ts';
import { openArchive, type ArchiveEntries } from './read-archive.ts';
import { acceptArchiveName, readLibraryContent, type LibraryContent } from './read-library-content.ts';

/** A stored photo: the row's fields, by the archive's image name. */
type StoredPhotos = Map<string, { id: string; imageKey: string; thumbnailKey: string; width: number; height: number; bytes: number }>;

const date = (iso: string) => new Date(iso);

/**
 * Adds an archive's library to an account; nothing there is changed or replaced. Every entry is
 * read and checked first; then the photos are checked and stored; then every row is written in one
 * transaction. When anything fails, the photos stored so far are deleted again, so a refused
 * archive leaves the account as it was.
 */
export function createLibraryImport(deps: { archives: ArchiveRepository; store: ObjectStore }) {
  async function storePhotos(ownerId: string, archive: ArchiveEntries, content: LibraryContent, stored: string[]): Promise<StoredPhotos> {
    const photos: StoredPhotos = new Map();
    for (const photo of content.burns.flatMap((burn) => burn.photos)) {
      const id = randomUUID();
      const extension = archivePhotoExtension[photo.contentType];
      const image = await archive.read(photo.image, MAX_PHOTO_BYTES);
      const size = await checkArchivedPhoto(image, { name: photo.image, contentType: photo.contentType, size: { width: photo.width, height: photo.height } });
      const thumbnail = await archive.read(photo.thumbnail, MAX_PHOTO_BYTES);
      await checkArchivedPhoto(thumbnail, { name: photo.thumbnail, contentType: photo.contentType, size: 'thumbnail' });
      const imageKey = `photos/${ownerId}/${id}.${extension}`;
      const thumbnailKey = `photos/${ownerId}/${id}-thumb.${extension}`;
      // Named before the write, so a write that fails half-way is cleaned up too.
      stored.push(imageKey);
      await deps.store.put(imageKey, image, photo.contentType);
      stored.push(thumbnailKey);
      await deps.store.put(thumbnailKey, thumbnail, photo.contentType);
      photos.set(photo.image, { id, imageKey, thumbnailKey, ...size, bytes: image.length });
    }
    return photos;
  }

  return {
    async importLibrary(ownerId: string, archivePath: string, options: { preferences: 'take' | 'keep' }): Promise<ImportSummary> {
      const archive = await openArchive(archivePath, archiveLimits, acceptArchiveName);
      const stored: string[] = [];
      try {
        const content = await readLibraryContent(archive);
        // Said before any photo is stored; checked again inside the transaction.
        const existing = await deps.archives.readExisting(ownerId);
        checkCaps(content, existing);
        const photos = await storePhotos(ownerId, archive, content, stored);
        await deps.archives.importAll(ownerId, (now) => rowsFor(ownerId, content, photos, checkCaps(content, now), options.preferences === 'take'));
        return { ...content.manifest.counts, preferences: options.preferences === 'take' ? 'taken' : 'kept' };
      } catch (error) {
        await deps.store.delete(stored).catch((cause: unknown) => console.error(`Could not delete ${stored.length} file(s) of a refused import: ${(cause as Error).message}`));
        throw error;
      } finally {
        archive.close();
      }
    },
  };
}

export type LibraryImporter = ReturnType<typeof createLibraryImport>;

/** The account's caps hold for the library after the import, or nothing is imported. */
function checkCaps(content: LibraryContent, existing: ExistingLibrary): ExistingLibrary {
  if (existing.designs + content.designs.length > MAX_DESIGNS) {
    throw new AppError(409, 'DESIGN_LIMIT', `This archive holds ${content.designs.length} designs and your library has ${existing.designs}; one account keeps at most ${MAX_DESIGNS}. Delete designs you no longer need, then import again. Nothing was imported.`);
  }
  const long = content.designs.find((design) => design.versions.length > MAX_VERSIONS);
  if (long) throw new AppError(409, 'VERSION_LIMIT', `The design "${long.name}" in this archive has ${long.versions.length} versions; one design keeps at most ${MAX_VERSIONS}. Nothing was imported.`);
  if (existing.profiles + content.profiles.length > MAX_PRINTER_PROFILES) {
    throw new AppError(409, 'PRINTER_PROFILE_LIMIT', `This archive holds ${content.profiles.length} printer profiles and you have ${existing.profiles}; one account keeps at most ${MAX_PRINTER_PROFILES}. Delete profiles you no longer use, then import again. Nothing was imported.`);
  }
  return existing;
}

/** New ids for everything; dates as the archive has them, so the history reads as it did. */
function rowsFor(ownerId: string, content: LibraryContent, photos: StoredPhotos, existing: ExistingLibrary, takePreferences: boolean): ImportRows {
  const rows: ImportRows = { designs: [], versions: [], burns: [], photos: [], profiles: [] };
  const versionIds = new Map<string, string[]>();
  const designIds = new Map<string, string>();
  for (const design of content.designs) {
    const id = randomUUID();
    designIds.set(design.key, id);
    rows.designs.push({ id, ownerId, name: design.name, tags: design.tags, lastPrintedAt: design.lastPrintedAt ? date(design.lastPrintedAt) : null, currentVersion: design.versions.length, createdAt: date(design.createdAt), updatedAt: date(design.updatedAt) });
    const ids = design.versions.map((version, index) => {
      const versionId = randomUUID();
      rows.versions.push({ id: versionId, designId: id, number: version.number, document: version.document, summary: design.summaries[index]!, note: version.note || null, createdAt: date(version.createdAt) });
      return versionId;
    });
    versionIds.set(design.key, ids);
  }
  for (const { design, version, date: burnedAt, createdAt, updatedAt, photos: burnPhotos, ...fields } of content.burns) {
    const id = randomUUID();
    rows.burns.push({ id, ownerId, designId: designIds.get(design)!, versionId: versionIds.get(design)![version - 1]!, burnedAt: date(burnedAt), ...fields, createdAt: date(createdAt), updatedAt: date(updatedAt) });
    for (const photo of burnPhotos) {
      const stored = photos.get(photo.image)!;
      rows.photos.push({ id: stored.id, burnId: id, ownerId, imageKey: stored.imageKey, thumbnailKey: stored.thumbnailKey, contentType: photo.contentType, width: stored.width, height: stored.height, bytes: stored.bytes, createdAt: date(photo.createdAt) });
    }
  }
  // Exactly one default while any profile exists: the account's own stays; otherwise the archive's (or its first).
  const archivedDefault = Math.max(0, content.profiles.findIndex((p) => p.isDefault));
  content.profiles.forEach((profile, index) => {
    rows.profiles.push({ id: randomUUID(), userId: ownerId, name: profile.name, measuredXMm: profile.measuredXMm, measuredYMm: profile.measuredYMm, isDefault: !existing.hasDefaultProfile && index === archivedDefault, createdAt: date(profile.createdAt) });
  });
  if (takePreferences) rows.preferences = { ...content.preferences, ...(content.preferences.drillSetIds ? { drillSetIds: [...new Set(content.preferences.drillSetIds)] } : {}) };
  return rows;
}
