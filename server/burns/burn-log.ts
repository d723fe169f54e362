import { randomUUID } from 'node:crypto';
import { MAX_PHOTOS_PER_BURN, type Burn, type BurnList, type BurnPhoto, type CreateBurnInput, type UpdateBurnInput } from '../../shared/burns/burn-schema.ts';
import { AppError, notFound } from '../http/app-error.ts';
import type { ObjectStore } from '../storage/object-store.ts';
import type { BurnChange, BurnPhotoRow, BurnRepository, BurnRow } from './burn-repository.ts';
import { processPhoto } from './photo-processing.ts';

export const missingBurn = () => notFound('That burn entry');
export const missingPhoto = () => notFound('That photo');

type Fields = Omit<CreateBurnInput, 'date' | 'version'>;

/** The burn log: test burns of a maker's designs, each pinned to the version it tested, with photos. */
export function createBurnLog(burns: BurnRepository, store: ObjectStore) {
  function view(burn: BurnRow, version: number, photos: BurnPhotoRow[]): Burn {
    return {
      id: burn.id,
      designId: burn.designId,
      version,
      date: burn.burnedAt.toISOString(),
      fuelKind: burn.fuelKind,
      fuelMassG: burn.fuelMassG,
      starter: burn.starter,
      ambientC: burn.ambientC,
      wind: burn.wind as Burn['wind'],
      windscreen: burn.windscreen,
      windFacing: burn.windFacing,
      timeToLightS: burn.timeToLightS,
      timeToJetsS: burn.timeToJetsS,
      timeToBoilS: burn.timeToBoilS,
      boilWaterL: burn.boilWaterL,
      boilStartC: burn.boilStartC,
      burnTimeS: burn.burnTimeS,
      charG: burn.charG,
      smoke: burn.smoke as Burn['smoke'],
      flameRing: burn.flameRing,
      notes: burn.notes,
      photos: photos.filter((p) => p.burnId === burn.id).map(photoView),
      createdAt: burn.createdAt.toISOString(),
      updatedAt: burn.updatedAt.toISOString(),
    };
  }

  async function getBurn(ownerId: string, burnId: string): Promise<Burn> {
    const found = await burns.find(ownerId, burnId);
    if (!found) throw missingBurn();
    return view(found.burn, found.version, await burns.photosOf([burnId]));
  }

  /** Deletes stored files; a failure is logged, never shown (the rows are gone already). */
  async function forget(keys: string[]): Promise<void> {
    await store.delete(keys).catch((error: unknown) => console.error(`Could not delete ${keys.length} stored file(s): ${(error as Error).message}`));
  }

  return {
    async listBurns(ownerId: string, designId: string): Promise<BurnList> {
      const design = await burns.findVersion(ownerId, designId);
      if (!design.found && !design.design) throw notFound('That design');
      const rows = await burns.list(ownerId, designId);
      const photos = await burns.photosOf(rows.map((r) => r.burn.id));
      return { burns: rows.map((r) => view(r.burn, r.version, photos)) };
    },

    async logBurn(ownerId: string, designId: string, input: CreateBurnInput): Promise<Burn> {
      const version = await burns.findVersion(ownerId, designId, input.version);
      if (!version.found) {
        if (!version.design) throw notFound('That design');
        throw new AppError(404, 'NOT_FOUND', `This design has no version ${input.version}.`);
      }
      const { date, version: _pinned, ...fields } = input;
      const row = await burns.insert({ ownerId, designId, versionId: version.versionId, burnedAt: new Date(date), ...clean(fields) });
      return view(row, version.number, []);
    },

    getBurn,

    async updateBurn(ownerId: string, burnId: string, change: UpdateBurnInput): Promise<Burn> {
      const { date, ...fields } = change;
      const row = await burns.update(ownerId, burnId, { ...clean(fields), ...(date ? { burnedAt: new Date(date) } : {}) });
      if (!row) throw missingBurn();
      return getBurn(ownerId, burnId);
    },

    async deleteBurn(ownerId: string, burnId: string): Promise<void> {
      const keys = await burns.remove(ownerId, burnId);
      if (!keys) throw missingBurn();
      await forget(keys);
    },

    /**
     * Checks and re-encodes the picture, stores it and its thumbnail, then records it. Nothing is
     * left half-stored: when the record cannot be written (the entry is full or gone), the files go.
     */
    async addPhoto(ownerId: string, burnId: string, bytes: Buffer): Promise<BurnPhoto> {
      if (!(await burns.find(ownerId, burnId))) throw missingBurn();
      const photo = await processPhoto(bytes);
      const id = randomUUID();
      const extension = photo.contentType === 'image/webp' ? 'webp' : 'jpg';
      const imageKey = `photos/${ownerId}/${id}.${extension}`;
      const thumbnailKey = `photos/${ownerId}/${id}-thumb.${extension}`;
      const stored: string[] = [];
      try {
        await store.put(imageKey, photo.image, photo.contentType);
        stored.push(imageKey);
        await store.put(thumbnailKey, photo.thumbnail, photo.contentType);
        stored.push(thumbnailKey);
        const row = await burns.addPhotoWithinCap(ownerId, { id, burnId, imageKey, thumbnailKey, contentType: photo.contentType, width: photo.width, height: photo.height, bytes: photo.image.length }, MAX_PHOTOS_PER_BURN);
        if (row === 'missing') throw missingBurn();
        if (row === 'full') throw new AppError(409, 'TOO_MANY_PHOTOS', `An entry holds at most ${MAX_PHOTOS_PER_BURN} photos. Delete one to add another.`);
        return photoView(row);
      } catch (error) {
        await forget(stored);
        throw error;
      }
    },

    /**
     * A workshop member's burn of the workshop's kit: pinned to the kit's version of the
     * instructor's design, owned by the member, and marked with the workshop.
     */
    async logKitBurn(ownerId: string, kit: { designId: string; versionId: string; version: number; workshopId: string }, input: Omit<CreateBurnInput, 'version'>): Promise<Burn> {
      const { date, ...fields } = input;
      const row = await burns.insert({ ownerId, designId: kit.designId, versionId: kit.versionId, workshopId: kit.workshopId, burnedAt: new Date(date), ...clean(fields) });
      return view(row, kit.version, []);
    },

    /** Entries with their photos, as the API shows them. */
    async views(rows: { burn: BurnRow; version: number }[]): Promise<Burn[]> {
      const photos = await burns.photosOf(rows.map((r) => r.burn.id));
      return rows.map((r) => view(r.burn, r.version, photos));
    },

    /** The picture (or its thumbnail) of one of the owner's photos, or of a burn in a workshop they run. */
    async readPhoto(ownerId: string, photoId: string, size: 'image' | 'thumbnail'): Promise<{ bytes: Uint8Array; contentType: string }> {
      const row = (await burns.findPhoto(ownerId, photoId)) ?? (await burns.findPhotoInWorkshopOf(ownerId, photoId));
      if (!row) throw missingPhoto();
      const bytes = await store.get(size === 'image' ? row.imageKey : row.thumbnailKey);
      if (!bytes) throw missingPhoto();
      return { bytes, contentType: row.contentType };
    },

    async deletePhoto(ownerId: string, photoId: string): Promise<void> {
      const row = await burns.removePhoto(ownerId, photoId);
      if (!row) throw missingPhoto();
      await forget([row.imageKey, row.thumbnailKey]);
    },

    /** For deleting a design: the stored files of its burns, to delete once the design is gone. */
    photoKeysOfDesign: (ownerId: string, designId: string) => burns.photoKeysOfDesign(ownerId, designId),
    forget,
  };
}

export type BurnLog = ReturnType<typeof createBurnLog>;

function photoView(row: BurnPhotoRow): BurnPhoto {
  return {
    id: row.id,
    width: row.width,
    height: row.height,
    contentType: row.contentType as BurnPhoto['contentType'],
    url: `/api/photos/${row.id}`,
    thumbnailUrl: `/api/photos/${row.id}/thumbnail`,
    createdAt: row.createdAt.toISOString(),
  };
}

/** Fields as the database takes them: absent stays absent, null clears. */
function clean(fields: Fields): BurnChange {
  return Object.fromEntries(Object.entries(fields).filter(([, value]) => value !== undefined)) as BurnChange;
}
