import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { AppError } from '../errors';

export const IMAGE_MAX_BYTES = 10 * 1024 * 1024;
const IMAGE_TYPES = new Set(['image/jpeg', 'image/png', 'image/webp', 'image/heic', 'image/heif']);

/**
 * Checks an uploaded photo by its content (not its name), then returns a web-sized copy and a
 * thumbnail, both WebP, rotated upright and stripped of metadata (location included).
 */
export async function prepareImage(buffer: Buffer, field: string) {
  const type = await fileTypeFromBuffer(buffer);
  if (!type || !IMAGE_TYPES.has(type.mime)) {
    const message = `The file is ${type ? type.mime : 'not an image'}; upload a JPEG, PNG, WebP or HEIC photo`;
    throw new AppError(422, 'invalid_upload', message, { [field]: message });
  }
  try {
    const image = sharp(buffer, { failOn: 'error' }).rotate();
    const [full, thumb] = await Promise.all([
      image
        .clone()
        .resize({ width: 1600, height: 1600, fit: 'inside', withoutEnlargement: true })
        .webp({ quality: 82 })
        .toBuffer(),
      image
        .clone()
        .resize({ width: 320, height: 320, fit: 'cover' })
        .webp({ quality: 75 })
        .toBuffer(),
    ]);
    return { full, thumb, contentType: 'image/webp' };
  } catch {
    const message = 'The photo could not be read; it may be damaged';
    throw new AppError(422, 'invalid_upload', message, { [field]: message });
  }
}
