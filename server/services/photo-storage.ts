import { S3Client, PutObjectCommand, GetObjectCommand, DeleteObjectCommand } from '@aws-sdk/client-s3';
import sharp from 'sharp';
import { randomUUID } from 'node:crypto';
import type { S3Config } from '../config';
import { HttpError, badRequest } from '../lib/http-error';

export const MAX_PHOTO_BYTES = 5 * 1024 * 1024;
const MAX_EDGE_PX = 1600;
/** the recipe book list shows photos at most 96 CSS px wide; 240 px covers a 2.5× phone screen */
const THUMB_EDGE_PX = 240;
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
function notAPhoto(detail: string) {
  const message = `This file is not a photo${detail}. Upload a JPEG, PNG or WebP picture.`;
  return badRequest(`file: ${message}`, { fieldErrors: { file: [message] } });
}

/**
 * Checks the image by its content (JPEG, PNG or WebP), turns it upright, resizes it to at most
 * 1600 px on its long edge and re-encodes it as WebP, with a small thumbnail for the recipe book;
 * sharp drops EXIF, GPS and other metadata.
 */
export async function processPhoto(buffer: Buffer): Promise<{ image: Buffer; thumbnail: Buffer }> {
  let format: string | undefined;
  try {
    format = (await sharp(buffer).metadata()).format;
  } catch {
    throw notAPhoto('');
  }
  if (!format || !ACCEPTED.has(format))
    throw notAPhoto(format === 'heif' ? ' Hearthswap can read (HEIC)' : format ? ` Hearthswap can read (${format.toUpperCase()})` : '');
  try {
    const upright = sharp(buffer).rotate();
    const image = await upright
      .clone()
      .resize({ width: MAX_EDGE_PX, height: MAX_EDGE_PX, fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 82 })
      .toBuffer();
    const thumbnail = await sharp(image).resize({ width: THUMB_EDGE_PX, height: THUMB_EDGE_PX, fit: 'cover' }).webp({ quality: 70 }).toBuffer();
    return { image, thumbnail };
  } catch {
    // The header read fine but the pixels do not decode: a truncated or damaged file.
    const message = 'This file is not a readable photo: it may be cut short or damaged. Upload the JPEG, PNG or WebP again.';
    throw badRequest(`file: ${message}`, { fieldErrors: { file: [message] } });
  }
}

/** Where a photo's thumbnail lives beside it. */
export function thumbnailKey(key: string) {
  return key.replace(/\.webp$/, '-thumb.webp');
}

/** A thumbnail made from the stored photo, for photos saved before thumbnails were. */
export async function thumbnailFrom(image: Buffer) {
  return sharp(image).resize({ width: THUMB_EDGE_PX, height: THUMB_EDGE_PX, fit: 'cover' }).webp({ quality: 70 }).toBuffer();
}

export async function storePhoto(
  config: S3Config | null,
  recipeId: number,
  photo: { image: Buffer; thumbnail: Buffer },
): Promise<{ key: string; type: string }> {
  const s3 = requireConfig(config);
  const key = `recipes/${recipeId}/${randomUUID()}.webp`;
  await client(s3).send(new PutObjectCommand({ Bucket: s3.bucket, Key: key, Body: photo.image, ContentType: 'image/webp' }));
  await client(s3).send(new PutObjectCommand({ Bucket: s3.bucket, Key: thumbnailKey(key), Body: photo.thumbnail, ContentType: 'image/webp' }));
  return { key, type: 'image/webp' };
}

export async function readPhoto(config: S3Config | null, key: string): Promise<Buffer> {
  const s3 = requireConfig(config);
  const out = await client(s3).send(new GetObjectCommand({ Bucket: s3.bucket, Key: key }));
  return Buffer.from(await out.Body!.transformToByteArray());
}

/** Removes a photo and its thumbnail; a missing object is not an error. */
export async function removePhoto(config: S3Config | null, key: string) {
  if (!config) return;
  for (const k of [key, thumbnailKey(key)]) {
    await client(config)
      .send(new DeleteObjectCommand({ Bucket: config.bucket, Key: k }))
      .catch(() => {});
  }
}
