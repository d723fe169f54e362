import { fileTypeFromBuffer } from 'file-type';
import sharp, { type Metadata } from 'sharp';
import { MAX_PHOTO_BYTES, MAX_PHOTO_PIXELS } from '../../shared/burns/burn-schema.ts';
import { AppError } from '../http/app-error.ts';
import { PHOTO_LONGEST_SIDE, THUMBNAIL_LONGEST_SIDE } from '../burns/photo-processing.ts';

export interface ExpectedPhoto {
  name: string;
  contentType: 'image/jpeg' | 'image/webp';
  /** The picture's size as burns.json says it; a thumbnail is only held to the thumbnail's cap. */
  size: { width: number; height: number } | 'thumbnail';
}

const refuse = (name: string, why: string) => new AppError(422, 'ARCHIVE_PHOTO_REFUSED', `The photo ${JSON.stringify(name)} in this archive ${why}, so nothing was imported.`);

/**
 * A photo from an archive is stored with its bytes as they are (so an export and its import
 * give the same bytes), so it must already be what an upload would have stored: by its first
 * bytes (file-type) a JPEG or WebP of the type burns.json names, within the stored photo's size
 * (or the thumbnail's), under the pixel cap, decodable to its end, and with no metadata at all
 * (EXIF, GPS, XMP, IPTC, ICC): an upload drops them, and an archive could carry them back in.
 */
export async function checkArchivedPhoto(bytes: Buffer, expected: ExpectedPhoto): Promise<{ width: number; height: number }> {
  if (bytes.length > MAX_PHOTO_BYTES) throw refuse(expected.name, `is larger than ${MAX_PHOTO_BYTES / 1024 / 1024} MB`);
  const type = await fileTypeFromBuffer(bytes);
  if (!type || type.mime !== expected.contentType) throw refuse(expected.name, `is not the ${expected.contentType === 'image/jpeg' ? 'JPEG' : 'WebP'} picture burns.json says it is`);
  const input = () => sharp(bytes, { limitInputPixels: MAX_PHOTO_PIXELS, failOn: 'error' });
  let metadata: Metadata;
  try {
    metadata = await input().metadata();
    // Decoding it whole finds a picture that is broken or cut short inside.
    await input().stats();
  } catch {
    throw refuse(expected.name, 'could not be read (damaged, cut short or too large)');
  }
  if (metadata.exif || metadata.xmp || metadata.iptc || metadata.icc) throw refuse(expected.name, 'carries metadata (such as EXIF or GPS) that Canwright never keeps');
  const width = metadata.width ?? 0;
  const height = metadata.height ?? 0;
  const longest = expected.size === 'thumbnail' ? THUMBNAIL_LONGEST_SIDE : PHOTO_LONGEST_SIDE;
  if (Math.max(width, height) > longest) throw refuse(expected.name, `is larger than ${longest} pixels on its longest side`);
  if (expected.size !== 'thumbnail' && (width !== expected.size.width || height !== expected.size.height)) {
    throw refuse(expected.name, `is ${width} x ${height} pixels, not the ${expected.size.width} x ${expected.size.height} burns.json says`);
  }
  return { width, height };
}
