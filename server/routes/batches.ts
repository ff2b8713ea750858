import { Router, type Request, type Response } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { batchCreate, planQuery, sealCheckBody } from '../../shared/schemas/batches';
import { currentMembership, householdAccess } from '../auth/guards';
import type { AppContext } from '../context';
import { AppError } from '../http/errors';
import { body, params, query } from '../http/validate';
import { batchDetail, createBatch, listBatches, previewPlan } from '../services/shelf/batches';
import { PHOTO_SIZES } from '../services/shelf/photo-images';
import { checkSeals } from '../services/shelf/seal-check';
import { PHOTO_MAX_BYTES, readBatchPhoto, saveBatchPhoto } from '../services/shelf/photos';

const batchParams = z.object({ hid: z.string(), batchId: z.uuid({ error: 'That batch was not found.' }) });
const photoQuery = z.object({
  size: z.enum(Object.keys(PHOTO_SIZES) as [keyof typeof PHOTO_SIZES]).default('large'),
  v: z.string().max(40).optional(),
});
const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: PHOTO_MAX_BYTES, files: 1, fields: 5 },
}).single('photo');

/** Runs multer and turns its errors into answers a person can act on. */
function receivePhoto(req: Request, res: Response): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    upload(req, res, (error: unknown) => {
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE')
          return reject(
            new AppError(
              413,
              'too_large',
              'That photo is larger than 5 MB. Choose a smaller one, or lower the camera’s resolution.',
            ),
          );
        return reject(new AppError(400, 'invalid_input', 'Send one photo in the field “photo”.'));
      }
      if (error) return reject(error);
      if (!req.file)
        return reject(new AppError(400, 'invalid_input', 'Choose a photo to upload.', { photo: 'Choose a photo.' }));
      resolve(req.file.buffer);
    });
  });
}

export function batchesRouter(ctx: AppContext) {
  const router = Router({ mergeParams: true });
  const { photos } = ctx;

  router.get('/batches', householdAccess('read'), async (req, res) => {
    res.json({ batches: await listBatches(currentMembership(req).householdId) });
  });

  router.get('/batches/plan', householdAccess('read'), async (req, res) => {
    const { recipeId, jarSize, method } = query(req, planQuery);
    res.json({ plan: await previewPlan(currentMembership(req).household, recipeId, jarSize, method) });
  });

  router.get('/batches/:batchId', householdAccess('read'), async (req, res) => {
    const { batchId } = params(req, batchParams);
    res.json({ batch: await batchDetail(currentMembership(req).household, batchId) });
  });

  router.post('/batches', householdAccess('cook'), async (req, res) => {
    const input = body(req, batchCreate);
    res.status(201).json(await createBatch(ctx.sequelize, currentMembership(req).household, input, req.user!.id));
  });

  // Any member may check seals; reprocessing (a new processing record) needs a cook, which the service checks.
  router.post('/batches/:batchId/seal-check', householdAccess('handleJars'), async (req, res) => {
    const { batchId } = params(req, batchParams);
    const input = body(req, sealCheckBody);
    const { household, role } = currentMembership(req);
    res.json(await checkSeals(ctx.sequelize, household, role, batchId, input, req.user!.id));
  });

  router.post('/batches/:batchId/photo', householdAccess('cook'), async (req, res) => {
    const { batchId } = params(req, batchParams);
    const bytes = await receivePhoto(req, res);
    await saveBatchPhoto(photos, currentMembership(req).householdId, batchId, bytes);
    res.json({ batch: await batchDetail(currentMembership(req).household, batchId) });
  });

  router.get('/batches/:batchId/photo', householdAccess('read'), async (req, res) => {
    const { batchId } = params(req, batchParams);
    const { size } = query(req, photoQuery);
    const photo = await readBatchPhoto(photos, currentMembership(req).householdId, batchId, size);
    res
      .set({ 'Content-Type': photo.type, 'Cache-Control': 'private, no-cache', 'Content-Disposition': 'inline' })
      .send(photo.bytes);
  });

  return router;
}
