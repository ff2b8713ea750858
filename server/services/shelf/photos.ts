import { randomUUID } from 'node:crypto';
import { fileTypeFromBuffer } from 'file-type';
import { AppError, notFound } from '../../http/errors';
import type { PhotoStorage } from '../photo-storage';
import { findBatch } from './batches';
import { PHOTO_SIZES, reencodePhoto, type PhotoSize } from './photo-images';

export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;
const PHOTO_TYPES = new Set(['image/jpeg', 'image/png', 'image/webp']);

/** A re-encoded photo's key names its folder; each kept size is one object inside it. */
export const photoObjectKey = (photoKey: string, size: PhotoSize) => `${photoKey}/${size}.webp`;
/** Photos stored before re-encoding kept their file name's extension and a single size. */
export const isKeptAsUploaded = (photoKey: string) => /\.(jpg|png|webp)$/.test(photoKey);

/** Re-encoded versions of a photo under a fresh key, written to the store before anyone points at them. */
export async function storeVersions(storage: PhotoStorage, householdId: string, bytes: Buffer) {
  const versions = await reencodePhoto(bytes);
  const photoKey = `${householdId}/${randomUUID()}`;
  for (const size of Object.keys(PHOTO_SIZES) as PhotoSize[])
    await storage.save(photoObjectKey(photoKey, size), versions[size], 'image/webp');
  return { photoKey, versions };
}

export async function removeVersions(storage: PhotoStorage, photoKey: string) {
  if (isKeptAsUploaded(photoKey)) return storage.remove(photoKey);
  await Promise.all(
    (Object.keys(PHOTO_SIZES) as PhotoSize[]).map((size) => storage.remove(photoObjectKey(photoKey, size))),
  );
}

/** Stores a batch photo, judged by its bytes, never by its name or the type the browser claims. */
export async function saveBatchPhoto(storage: PhotoStorage, householdId: string, batchId: string, bytes: Buffer) {
  const batch = await findBatch(householdId, batchId);
  const sniffed = await fileTypeFromBuffer(bytes);
  if (!sniffed || !PHOTO_TYPES.has(sniffed.mime)) {
    throw new AppError(
      415,
      'unsupported_type',
      'That file is not a JPEG, PNG or WebP photo. Choose a photo taken with a camera or phone.',
    );
  }
  const { photoKey } = await storeVersions(storage, householdId, bytes);
  const previous = batch.photoKey;
  await batch.update({ photoKey, photoType: 'image/webp' });
  if (previous) await removeVersions(storage, previous).catch(() => {});
}

export async function readBatchPhoto(storage: PhotoStorage, householdId: string, batchId: string, size: PhotoSize) {
  const batch = await findBatch(householdId, batchId);
  const key =
    batch.photoKey && (isKeptAsUploaded(batch.photoKey) ? batch.photoKey : photoObjectKey(batch.photoKey, size));
  const bytes = key ? await storage.read(key) : null;
  if (!bytes || !batch.photoType) throw notFound('That batch’s photo');
  return { bytes, type: batch.photoType };
}
