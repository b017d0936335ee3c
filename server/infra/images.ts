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

export type PreparedAttachment =
  | { kind: 'image'; full: Buffer; thumb: Buffer; contentType: 'image/webp' }
  | { kind: 'pdf'; body: Buffer; contentType: 'application/pdf' };

/**
 * Checks an attachment by its content: a photo (prepared as by prepareImage) or a PDF (kept as
 * sent). Anything else, whatever its name says, is refused naming the field.
 */
export async function prepareAttachment(
  buffer: Buffer,
  field: string,
): Promise<PreparedAttachment> {
  const type = await fileTypeFromBuffer(buffer);
  if (type?.mime === 'application/pdf') {
    return { kind: 'pdf', body: buffer, contentType: 'application/pdf' };
  }
  if (!type || !IMAGE_TYPES.has(type.mime)) {
    const message = `The file is ${type ? type.mime : 'of an unknown type'}; attach a photo (JPEG, PNG, WebP, HEIC) or a PDF`;
    throw new AppError(422, 'invalid_upload', message, { [field]: message });
  }
  const { full, thumb } = await prepareImage(buffer, field);
  return { kind: 'image', full, thumb, contentType: 'image/webp' };
}
