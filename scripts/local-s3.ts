import S3rver from 's3rver';
import path from 'node:path';
import { mkdirSync } from 'node:fs';

export const LOCAL_S3_KEYS = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };

/** An S3-compatible fake (s3rver) on loopback for photos in development and tests. */
export async function startLocalS3(directory: string, port: number, bucket = 'hearthswap-photos') {
  mkdirSync(path.resolve(directory), { recursive: true });
  const server = new S3rver({
    port,
    address: '127.0.0.1',
    silent: true,
    directory: path.resolve(directory),
    configureBuckets: [{ name: bucket, configs: [] }],
  });
  const address = await server.run();
  return {
    env: {
      S3_ENDPOINT: `http://127.0.0.1:${address.port}`,
      S3_BUCKET: bucket,
      S3_REGION: 'us-east-1',
      S3_ACCESS_KEY_ID: LOCAL_S3_KEYS.accessKeyId,
      S3_SECRET_ACCESS_KEY: LOCAL_S3_KEYS.secretAccessKey,
    },
    close: () => server.close(),
  };
}

/** Sets the S3_* variables to a local fake unless S3_BUCKET is already configured. */
export async function ensureS3(directory: string, port: number) {
  if (process.env.S3_BUCKET) return { close: async () => {} };
  const local = await startLocalS3(directory, port);
  Object.assign(process.env, local.env);
  return local;
}
