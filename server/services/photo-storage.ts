import { S3Client, PutObjectCommand, GetObjectCommand, DeleteObjectCommand } from '@aws-sdk/client-s3';
import sharp from 'sharp';
import { randomUUID } from 'node:crypto';
import type { S3Config } from '../config';
import { HttpError, badRequest } from '../lib/http-error';

export const MAX_PHOTO_BYTES = 5 * 1024 * 1024;
const MAX_EDGE_PX = 1600;
const ACCEPTED = new Set(['jpeg', 'png', 'webp']);

const clients = new WeakMap<S3Config, S3Client>();
function client(config: S3Config) {
  let c = clients.get(config);
  if (!c) {
    c = new S3Client({
      endpoint: config.endpoint,
      region: config.region,
      forcePathStyle: config.forcePathStyle,
      credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
    });
    clients.set(config, c);
  }
  return c;
}

function requireConfig(config: S3Config | null): S3Config {
  if (!config) throw new HttpError(503, 'storage_unavailable', 'Photo storage is not configured on this server (set S3_BUCKET and friends).');
  return config;
}

/**
 * Checks the image by its content (JPEG, PNG or WebP), turns it upright, resizes it to at most
 * 1600 px on its long edge and re-encodes it as WebP; sharp drops EXIF, GPS and other metadata.
 */
export async function processPhoto(buffer: Buffer): Promise<Buffer> {
  let format: string | undefined;
  try {
    format = (await sharp(buffer).metadata()).format;
  } catch {
    throw badRequest('file: this is not an image Hearthswap can read; upload a JPEG, PNG or WebP photo.');
  }
  if (!format || !ACCEPTED.has(format)) throw badRequest(`file: ${format ?? 'this'} images are not accepted; upload a JPEG, PNG or WebP photo.`);
  try {
    return await sharp(buffer)
      .rotate()
      .resize({ width: MAX_EDGE_PX, height: MAX_EDGE_PX, fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 82 })
      .toBuffer();
  } catch {
    // The header read fine but the pixels do not decode: a truncated or damaged file.
    throw badRequest('file: This file is not a readable photo (it may be cut short or damaged); upload the JPEG, PNG or WebP again.');
  }
}

export async function storePhoto(config: S3Config | null, recipeId: number, image: Buffer): Promise<{ key: string; type: string }> {
  const s3 = requireConfig(config);
  const key = `recipes/${recipeId}/${randomUUID()}.webp`;
  await client(s3).send(new PutObjectCommand({ Bucket: s3.bucket, Key: key, Body: image, ContentType: 'image/webp' }));
  return { key, type: 'image/webp' };
}

export async function readPhoto(config: S3Config | null, key: string): Promise<Buffer> {
  const s3 = requireConfig(config);
  const out = await client(s3).send(new GetObjectCommand({ Bucket: s3.bucket, Key: key }));
  return Buffer.from(await out.Body!.transformToByteArray());
}

export async function removePhoto(config: S3Config | null, key: string) {
  if (!config) return;
  await client(config)
    .send(new DeleteObjectCommand({ Bucket: config.bucket, Key: key }))
    .catch(() => {});
}
