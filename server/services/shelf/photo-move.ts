import { Op } from 'sequelize';
import { Batch } from '../../db/models';
import type { PhotoStorage } from '../photo-storage';
import { isKeptAsUploaded, storeVersions } from './photos';

export interface MoveReport {
  moved: number;
  /** batches whose photo file was not on this disk (another machine's, or deleted) */
  missing: string[];
  /** batches whose photo could not be re-encoded, with the reason */
  refused: { batchId: string; reason: string }[];
}

/**
 * Moves photos kept as uploaded on local disk into the store, re-encoded like a new upload.
 * Safe to run again: a batch is switched to its new key only after both versions are written,
 * and only while it still points at the old file, so a rerun picks up what is left and nothing
 * is moved twice. The files on disk stay where they are until you remove them.
 */
export async function movePhotosToStore(disk: PhotoStorage, store: PhotoStorage): Promise<MoveReport> {
  const report: MoveReport = { moved: 0, missing: [], refused: [] };
  const batches = await Batch.findAll({
    where: { photoKey: { [Op.regexp]: '\\.(jpg|png|webp)$' } },
    order: [['createdAt', 'ASC']],
  });
  for (const batch of batches) {
    const oldKey = batch.photoKey!;
    if (!isKeptAsUploaded(oldKey)) continue;
    const bytes = await disk.read(oldKey);
    if (!bytes) {
      report.missing.push(batch.id);
      continue;
    }
    let photoKey: string;
    try {
      ({ photoKey } = await storeVersions(store, batch.householdId, bytes));
    } catch (error) {
      report.refused.push({ batchId: batch.id, reason: (error as Error).message });
      continue;
    }
    const [updated] = await Batch.update(
      { photoKey, photoType: 'image/webp' },
      { where: { id: batch.id, photoKey: oldKey } },
    );
    if (updated === 1) report.moved += 1;
  }
  return report;
}
