import { randomUUID } from 'node:crypto';
import { fileTypeFromBuffer } from 'file-type';
import { AppError, notFound } from '../../http/errors';
import type { PhotoStorage } from '../photo-storage';
import { findBatch } from './batches';

export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;
const PHOTO_TYPES: Record<string, 'jpg' | 'png' | 'webp'> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' };

/** Stores a batch photo, judged by its bytes, never by its name or the type the browser claims. */
export async function saveBatchPhoto(storage: PhotoStorage, householdId: string, batchId: string, bytes: Buffer) {
  const batch = await findBatch(householdId, batchId);
  const sniffed = await fileTypeFromBuffer(bytes);
  const extension = sniffed ? PHOTO_TYPES[sniffed.mime] : undefined;
  if (!sniffed || !extension) {
    throw new AppError(415, 'unsupported_type', 'That file is not a JPEG, PNG or WebP photo. Choose a photo taken with a camera or phone.');
  }
  const key = `${householdId}/${randomUUID()}.${extension}`;
  await storage.save(key, bytes);
  const previous = batch.photoKey;
  await batch.update({ photoKey: key, photoType: sniffed.mime });
  if (previous) await storage.remove(previous);
}

export async function readBatchPhoto(storage: PhotoStorage, householdId: string, batchId: string) {
  const batch = await findBatch(householdId, batchId);
  const bytes = batch.photoKey ? await storage.read(batch.photoKey) : null;
  if (!bytes || !batch.photoType) throw notFound('That batch’s photo');
  return { bytes, type: batch.photoType };
}
