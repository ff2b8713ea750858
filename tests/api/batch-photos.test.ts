import { randomUUID } from 'node:crypto';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Batch } from '../../server/db/models';
import { localDiskStorage } from '../../server/services/photo-storage';
import { movePhotosToStore } from '../../server/services/shelf/photo-move';
import { demoApp } from '../support/app';
import { cameraPhoto, hasGpsBlock, pixelFloodPng, storedPhotoKeys } from '../support/photos';
import { shelfLookups } from './shelf-helpers';

// Every photo here goes to the S3-compatible object store `npm test` runs (s3rver on loopback).
let ctx: Awaited<ReturnType<typeof demoApp>>;
let lookups: Awaited<ReturnType<typeof shelfLookups>>;
beforeAll(async () => {
  ctx = await demoApp();
  lookups = await shelfLookups(ctx, await ctx.signedIn('keeper@larderly.test'));
});
afterAll(() => ctx.close());

// The smallest valid PNG (a 1x1 pixel), so the sniffer has real image bytes.
const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
);

async function batchOf(productName: string) {
  return (await lookups.sealedJars(productName))[0].batchId;
}

describe('batch photos in the object store', () => {
  it('keeps a phone photo re-encoded as WebP, large for the batch page and small for lists, and shows it to members only', async () => {
    expect(ctx.ctx.photos.kind).toBe('s3');
    const cook = await ctx.signedIn('cook@larderly.test');
    const batchId = await batchOf('Pickled Beets');
    const original = await cameraPhoto(4032, 3024);
    const response = await cook
      .post(`${lookups.base}/batches/${batchId}/photo`)
      .attach('photo', original, { filename: 'beets.jpg', contentType: 'image/jpeg' });
    expect(response.status).toBe(200);
    expect(response.body.batch.hasPhoto).toBe(true);

    const helper = await ctx.signedIn('helper@larderly.test');
    const large = await helper.get(`${lookups.base}/batches/${batchId}/photo`);
    const small = await helper.get(`${lookups.base}/batches/${batchId}/photo?size=small`);
    expect([large.status, small.status]).toEqual([200, 200]);
    expect(large.headers['content-type']).toBe('image/webp');
    expect(await sharp(large.body).metadata()).toMatchObject({ format: 'webp', width: 1600, height: 1200 });
    expect(await sharp(small.body).metadata()).toMatchObject({ format: 'webp', width: 320, height: 240 });
    expect(large.body.length).toBeLessThan(original.length / 4);
    console.log(
      `photo sizes: uploaded JPEG 4032x3024 ${original.length} bytes; kept WebP large 1600x1200 ${large.body.length} bytes, small 320x240 ${small.body.length} bytes`,
    );

    const keys = await storedPhotoKeys(ctx.householdId);
    expect(keys.filter((k) => /\/(large|small)\.webp$/.test(k))).toHaveLength(2);
    expect(
      (await (await ctx.signedIn('neighbor@larderly.test')).get(`${lookups.base}/batches/${batchId}/photo`)).status,
    ).toBe(404);
    expect((await ctx.request.get(`${lookups.base}/batches/${batchId}/photo`)).status).toBe(401);
    // Nothing in the bucket answers without the app's signature.
    const direct = await fetch(`${process.env.S3_ENDPOINT}/${process.env.S3_BUCKET}/${keys[0]}`);
    expect(direct.status).toBe(403);
  });

  it('strips the GPS position and every other piece of metadata the camera wrote', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const batchId = await batchOf('Spiced Pear Butter');
    const original = await cameraPhoto(1200, 900, { gps: true });
    const before = await sharp(original).metadata();
    expect(hasGpsBlock(before.exif)).toBe(true);
    expect(original.includes(Buffer.from('Calloway Hollow pantry shelf'))).toBe(true);
    expect(
      (await cook.post(`${lookups.base}/batches/${batchId}/photo`).attach('photo', original, 'pear-butter.jpg')).status,
    ).toBe(200);
    for (const size of ['large', 'small']) {
      const kept = (await cook.get(`${lookups.base}/batches/${batchId}/photo?size=${size}`)).body as Buffer;
      const after = await sharp(kept).metadata();
      expect(after.format).toBe('webp');
      expect([after.exif, after.xmp, after.icc, after.iptc]).toEqual([undefined, undefined, undefined, undefined]);
      expect(kept.includes(Buffer.from('Calloway Hollow pantry shelf'))).toBe(false);
      expect(kept.includes(Buffer.from('Larderly test camera'))).toBe(false);
    }
  });

  it('refuses a 48 KB PNG that claims 20000 x 20000 pixels (a pixel flood) with 413, before decoding it, and stores nothing', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const batchId = await batchOf('Dilly Carrots');
    const flood = pixelFloodPng(20_000, 20_000);
    expect(flood.length).toBeLessThan(50 * 1024);
    const keysBefore = await storedPhotoKeys(ctx.householdId);
    const rssBefore = process.memoryUsage().rss;
    const response = await cook.post(`${lookups.base}/batches/${batchId}/photo`).attach('photo', flood, 'carrots.png');
    expect(response.status).toBe(413);
    expect(response.body.error).toMatchObject({
      code: 'too_large',
      message: expect.stringMatching(/50 megapixels at most/),
    });
    // Decoding it whole would take 400 MB (one byte a pixel); refusing it from the header takes next to nothing.
    expect(process.memoryUsage().rss - rssBefore).toBeLessThan(100 * 1024 * 1024);
    expect((await cook.get(`${lookups.base}/batches/${batchId}`)).body.batch.hasPhoto).toBe(false);
    expect(await storedPhotoKeys(ctx.householdId)).toEqual(keysBefore);
  });

  it('replacing a photo removes the old versions from the store', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const batchId = await batchOf('Plum Ketchup');
    await cook.post(`${lookups.base}/batches/${batchId}/photo`).attach('photo', PNG, 'ketchup.png');
    const first = await storedPhotoKeys(ctx.householdId);
    await cook
      .post(`${lookups.base}/batches/${batchId}/photo`)
      .attach('photo', await cameraPhoto(640, 480), 'ketchup.jpg');
    const second = await storedPhotoKeys(ctx.householdId);
    expect(second).toHaveLength(first.length);
    expect(second).not.toEqual(first);
  });

  it('refuses a text file renamed to .jpg with 415 and keeps no photo', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const batchId = await batchOf('Dilly Carrots');
    const before = await storedPhotoKeys(ctx.householdId);
    const response = await cook
      .post(`${lookups.base}/batches/${batchId}/photo`)
      .attach('photo', Buffer.from('These are my notes about the carrots, not a photo.\n'), {
        filename: 'carrots.jpg',
        contentType: 'image/jpeg',
      });
    expect(response.status).toBe(415);
    expect(response.body.error).toMatchObject({
      code: 'unsupported_type',
      message: expect.stringMatching(/not a JPEG, PNG or WebP/),
    });
    expect((await cook.get(`${lookups.base}/batches/${batchId}`)).body.batch.hasPhoto).toBe(false);
    expect(await storedPhotoKeys(ctx.householdId)).toEqual(before);
  });

  it('refuses a photo over 5 MB with 413', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const big = Buffer.concat([PNG, Buffer.alloc(5 * 1024 * 1024)]);
    const response = await cook
      .post(`${lookups.base}/batches/${await batchOf('Dilly Carrots')}/photo`)
      .attach('photo', big, 'big.png');
    expect(response.status).toBe(413);
    expect(response.body.error.message).toMatch(/larger than 5 MB/);
  });

  it('answers 400 when no photo is attached', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    expect(
      (await cook.post(`${lookups.base}/batches/${await batchOf('Dilly Carrots')}/photo`).field('note', 'x')).status,
    ).toBe(400);
  });
});

describe('moving photos from the local disk to the object store', () => {
  it('moves each photo once, re-encoded, names the ones it cannot find, and a second run moves nothing', async () => {
    const uploads = mkdtempSync(path.join(tmpdir(), 'larderly-old-photos-'));
    const onDisk = `${ctx.householdId}/${randomUUID()}.jpg`;
    mkdirSync(path.join(uploads, ctx.householdId), { recursive: true });
    const original = await cameraPhoto(2000, 1500, { gps: true });
    writeFileSync(path.join(uploads, onDisk), original);
    const [withFile, withoutFile] = [await batchOf('Sweet Corn Relish'), await batchOf('Hot Pepper Jelly')];
    await Batch.update({ photoKey: onDisk, photoType: 'image/jpeg' }, { where: { id: withFile } });
    await Batch.update(
      { photoKey: `${ctx.householdId}/${randomUUID()}.png`, photoType: 'image/png' },
      { where: { id: withoutFile } },
    );

    const first = await movePhotosToStore(localDiskStorage(uploads), ctx.ctx.photos);
    expect(first).toEqual({ moved: 1, missing: [withoutFile], refused: [] });
    const moved = await Batch.findByPk(withFile);
    expect(moved!.photoKey).toMatch(new RegExp(`^${ctx.householdId}/[0-9a-f-]{36}$`));
    expect(moved!.photoType).toBe('image/webp');
    const served = await (await ctx.signedIn('helper@larderly.test')).get(`${lookups.base}/batches/${withFile}/photo`);
    expect(served.status).toBe(200);
    const servedMetadata = await sharp(served.body).metadata();
    expect(servedMetadata).toMatchObject({ format: 'webp', width: 1600, height: 1200 });
    expect(servedMetadata.exif).toBeUndefined();

    const keysAfterFirst = await storedPhotoKeys(ctx.householdId);
    const second = await movePhotosToStore(localDiskStorage(uploads), ctx.ctx.photos);
    expect(second).toEqual({ moved: 0, missing: [withoutFile], refused: [] });
    expect((await Batch.findByPk(withFile))!.photoKey).toBe(moved!.photoKey);
    expect(await storedPhotoKeys(ctx.householdId)).toEqual(keysAfterFirst);
  });
});
