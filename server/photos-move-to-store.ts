// `npm run photos:move-to-store`: moves batch photos kept in UPLOAD_DIR into the object store (S3_BUCKET).
import { loadConfig } from './config';
import { acquireDatabase } from './db/sequelize';
import { localDiskStorage, objectStorage } from './services/photo-storage';
import { movePhotosToStore } from './services/shelf/photo-move';

const config = loadConfig();
if (!config.s3) throw new Error('Set S3_BUCKET (and the other S3_ settings) to the object store the photos move to.');
const database = acquireDatabase(config.databaseUrl, 2);
try {
  const report = await movePhotosToStore(localDiskStorage(config.uploadDir), objectStorage(config.s3));
  console.log(`larderly: moved ${report.moved} photo(s) from ${config.uploadDir} to the bucket ${config.s3.bucket}`);
  if (report.missing.length)
    console.log(
      `larderly: ${report.missing.length} batch photo(s) are not in ${config.uploadDir} (run this on the machine that has them): ${report.missing.join(', ')}`,
    );
  for (const { batchId, reason } of report.refused) console.log(`larderly: batch ${batchId}: photo refused: ${reason}`);
  process.exitCode = report.refused.length ? 1 : 0;
} finally {
  await database.release();
}
