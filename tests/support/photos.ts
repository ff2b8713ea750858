import { crc32, deflateSync } from 'node:zlib';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import sharp from 'sharp';
import { loadConfig } from '../../server/config';

/** A camera-like photo: a shelf of jars drawn in soft colour with sensor grain, as a JPEG, optionally carrying EXIF with a GPS position. */
export async function cameraPhoto(width: number, height: number, options: { gps?: boolean } = {}) {
  const jars = Array.from({ length: 6 }, (_, i) => {
    const x = (i + 0.5) * (width / 6);
    return `<rect x="${x - width / 16}" y="${height * 0.35}" width="${width / 8}" height="${height * 0.45}" rx="${width / 60}" fill="url(#fill${i % 3})"/>`;
  }).join('');
  const shelf = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}">
    <defs>
      <linearGradient id="wall" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#efe2c8"/><stop offset="1" stop-color="#a9825a"/></linearGradient>
      <linearGradient id="fill0" x1="0" y1="0" x2="1" y2="1"><stop offset="0" stop-color="#8c1d2c"/><stop offset="1" stop-color="#d9573b"/></linearGradient>
      <linearGradient id="fill1" x1="0" y1="0" x2="1" y2="1"><stop offset="0" stop-color="#4f6b1f"/><stop offset="1" stop-color="#c3c45a"/></linearGradient>
      <linearGradient id="fill2" x1="0" y1="0" x2="1" y2="1"><stop offset="0" stop-color="#c77d12"/><stop offset="1" stop-color="#f2c14e"/></linearGradient>
    </defs>
    <rect width="100%" height="100%" fill="url(#wall)"/>${jars}
    <rect y="${height * 0.8}" width="100%" height="${height * 0.05}" fill="#5b3a1e"/>
  </svg>`;
  // Grain made small and stretched, so it costs little to make and still defeats easy compression.
  const grain = await sharp({
    create: {
      width: Math.ceil(width / 4),
      height: Math.ceil(height / 4),
      channels: 3,
      background: '#808080',
      noise: { type: 'gaussian', mean: 128, sigma: 24 },
    },
  })
    .resize(width, height, { kernel: 'nearest' })
    .png({ compressionLevel: 0 })
    .toBuffer();
  let image = sharp(Buffer.from(shelf))
    .composite([{ input: grain, blend: 'soft-light' }])
    .jpeg({ quality: 92 });
  if (options.gps) {
    image = image.withExif({
      IFD0: { Make: 'Larderly test camera', ImageDescription: 'Calloway Hollow pantry shelf' },
      // 38 deg 02' 24" N, 78 deg 30' 36" W, written as EXIF rationals
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '38/1 2/1 24/1', GPSLongitudeRef: 'W', GPSLongitude: '78/1 30/1 36/1' },
    });
  }
  return image.toBuffer();
}

/** The EXIF GPS IFD pointer (tag 0x8825) in either byte order: present when a file carries a GPS block. */
export function hasGpsBlock(exif: Buffer | undefined) {
  return Boolean(
    exif &&
    (exif.includes(Buffer.from([0x88, 0x25, 0x00, 0x04])) || exif.includes(Buffer.from([0x25, 0x88, 0x04, 0x00]))),
  );
}

/**
 * A pixel flood: a valid PNG that claims width x height 1-bit grey pixels, all zero. The rows
 * compress to almost nothing, so a 20000 x 20000 canvas (400 megapixels) is a file of about 48 KB.
 */
export function pixelFloodPng(width: number, height: number) {
  const chunk = (type: string, data: Buffer) => {
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([1, 0, 0, 0, 0], 8); // bit depth 1, greyscale, deflate, no filter method, no interlace
  const row = Math.ceil(width / 8) + 1; // a filter byte, then the packed bits
  const pixels = deflateSync(Buffer.alloc(row * height), { level: 9 });
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', pixels),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** The keys in the test run's photo bucket under a household, read with the app's own S3 settings. */
export async function storedPhotoKeys(householdId: string) {
  const { s3 } = loadConfig({ ...process.env });
  if (!s3) throw new Error('The photo tests need the object store `npm test` starts (S3_BUCKET is not set).');
  const client = new S3Client({
    endpoint: s3.endpoint,
    region: s3.region,
    forcePathStyle: s3.forcePathStyle,
    credentials: s3.credentials,
  });
  const listed = await client.send(new ListObjectsV2Command({ Bucket: s3.bucket, Prefix: `${householdId}/` }));
  return (listed.Contents ?? []).map((object) => object.Key!).sort();
}
