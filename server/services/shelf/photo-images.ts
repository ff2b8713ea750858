import sharp, { type Metadata } from 'sharp';
import { AppError } from '../../http/errors';

/** 50 megapixels: above the largest photo a phone camera takes (8000 x 6000 = 48 MP). */
export const PHOTO_MAX_PIXELS = 50_000_000;
/** the longest side of each kept version: small for lists, large for the batch page */
export const PHOTO_SIZES = { small: 320, large: 1600 } as const;
export type PhotoSize = keyof typeof PHOTO_SIZES;

// One image at a time per process and no decoded-image cache: photos are rare, memory is shared.
sharp.concurrency(1);
sharp.cache(false);

const tooLarge = () =>
  new AppError(
    413,
    'too_large',
    `That image is too large to show: ${PHOTO_MAX_PIXELS / 1_000_000} megapixels at most. Choose a camera or phone photo, or make it smaller first.`,
  );

/**
 * Decodes the upload and writes each kept version as a fresh WebP. Dimensions are read from
 * the header first, and sharp refuses to decode past the pixel limit, so a small file that
 * claims a huge canvas (a pixel flood) is refused before any pixels are unpacked. Nothing of
 * the original metadata (EXIF, GPS position, XMP, ICC) is copied into the versions.
 */
export async function reencodePhoto(bytes: Buffer): Promise<Record<PhotoSize, Buffer>> {
  const decoderOptions = { limitInputPixels: PHOTO_MAX_PIXELS, failOn: 'error' as const };
  let header: Metadata;
  try {
    header = await sharp(bytes, decoderOptions).metadata();
  } catch (error) {
    throw isPixelLimit(error) ? tooLarge() : unreadable();
  }
  if (!header.width || !header.height || header.width * header.height > PHOTO_MAX_PIXELS) throw tooLarge();
  const versions = {} as Record<PhotoSize, Buffer>;
  for (const size of Object.keys(PHOTO_SIZES) as PhotoSize[]) {
    try {
      versions[size] = await sharp(bytes, decoderOptions)
        .rotate()
        .resize({ width: PHOTO_SIZES[size], height: PHOTO_SIZES[size], fit: 'inside', withoutEnlargement: true })
        .webp({ quality: size === 'small' ? 70 : 80 })
        .toBuffer();
    } catch (error) {
      throw isPixelLimit(error) ? tooLarge() : unreadable();
    }
  }
  return versions;
}

const isPixelLimit = (error: unknown) => /pixel limit/i.test(String((error as Error)?.message));
const unreadable = () =>
  new AppError(
    415,
    'unsupported_type',
    'That photo could not be read; it may be damaged. Choose another JPEG, PNG or WebP photo.',
  );
