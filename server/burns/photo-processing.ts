import { fileTypeFromBuffer } from 'file-type';
import sharp, { type Sharp } from 'sharp';
import { MAX_PHOTO_PIXELS } from '../../shared/burns/burn-schema.ts';
import { AppError } from '../http/app-error.ts';

/** Longest side of a stored photo and of its thumbnail, in pixels. */
export const PHOTO_LONGEST_SIDE = 2048;
export const THUMBNAIL_LONGEST_SIDE = 320;
const TAKEN = new Set(['image/jpeg', 'image/png', 'image/webp']);

export interface ProcessedPhoto {
  image: Buffer;
  thumbnail: Buffer;
  contentType: 'image/jpeg' | 'image/webp';
  width: number;
  height: number;
}

export const notAPhoto = () => new AppError(415, 'NOT_A_PHOTO', 'This file is not a photo Canwright can take: send a JPEG, PNG or WebP picture.');
export const tooManyPixels = () =>
  new AppError(413, 'PHOTO_TOO_LARGE', `This picture is too large: at most ${MAX_PHOTO_PIXELS / 1_000_000} megapixels. Save a smaller copy and send that.`);

/**
 * What a file is, by its first bytes (file-type), never by its name or the type the browser
 * claimed; then a new picture drawn from its pixels (sharp): turned upright by its orientation
 * tag, longest side capped, and written without any of the original's metadata (EXIF, GPS, XMP,
 * ICC are not copied unless asked, and here they are not). JPEG out; WebP where the picture has
 * transparency. sharp refuses to decode past the pixel cap, so a small file that would unpack to
 * a huge picture costs nothing.
 */
export async function processPhoto(bytes: Buffer): Promise<ProcessedPhoto> {
  const type = await fileTypeFromBuffer(bytes);
  if (!type || !TAKEN.has(type.mime)) throw notAPhoto();
  const input = () => sharp(bytes, { limitInputPixels: MAX_PHOTO_PIXELS, failOn: 'error' });
  let hasAlpha: boolean;
  try {
    const metadata = await input().metadata();
    if ((metadata.width ?? 0) * (metadata.height ?? 0) > MAX_PHOTO_PIXELS) throw tooManyPixels();
    hasAlpha = metadata.hasAlpha ?? false;
  } catch (error) {
    throw translate(error);
  }
  const contentType = hasAlpha ? 'image/webp' : 'image/jpeg';
  const encode = (pipeline: Sharp) => (hasAlpha ? pipeline.webp({ quality: 82 }) : pipeline.jpeg({ quality: 84, mozjpeg: true }));
  try {
    const image = await encode(input().rotate().resize({ width: PHOTO_LONGEST_SIDE, height: PHOTO_LONGEST_SIDE, fit: 'inside', withoutEnlargement: true })).toBuffer({ resolveWithObject: true });
    const thumbnail = await encode(sharp(image.data).resize({ width: THUMBNAIL_LONGEST_SIDE, height: THUMBNAIL_LONGEST_SIDE, fit: 'inside', withoutEnlargement: true })).toBuffer();
    return { image: image.data, thumbnail, contentType, width: image.info.width, height: image.info.height };
  } catch (error) {
    throw translate(error);
  }
}

function translate(error: unknown): unknown {
  if (error instanceof AppError) return error;
  const message = (error as Error).message ?? '';
  if (/pixel limit/i.test(message)) return tooManyPixels();
  // A file that starts like a picture but is broken inside.
  return new AppError(422, 'PHOTO_UNREADABLE', 'This picture could not be read: the file may be damaged or cut short. Try another copy.');
}
