// The local S3-compatible fake (s3rver) on loopback. The app talks to it through @aws-sdk/client-s3,
// exactly as it would to a real bucket. Objects live as files under `dir` (a fresh folder for npm test,
// .data/s3 for npm start). The bucket is created only when its folder is missing: s3rver refuses to
// create a bucket twice in a reused directory.
import { existsSync, mkdirSync } from 'node:fs';
import path from 'node:path';

export const S3_FAKE_CREDENTIALS = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };

/** Starts the fake; resolves { env, close } where env holds the app's S3_* settings. */
export async function startS3Fake({ dir, bucket = 'uploads', port = 0 }) {
  process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED = 'true';
  const { default: S3rver } = await import('s3rver');
  mkdirSync(dir, { recursive: true });
  const configureBuckets = existsSync(path.join(dir, bucket)) ? [] : [{ name: bucket, configs: [] }];
  const fake = new S3rver({ address: '127.0.0.1', port, silent: true, directory: dir, configureBuckets });
  const address = await fake.run();
  return {
    env: {
      S3_ENDPOINT: `http://127.0.0.1:${address.port}`,
      S3_BUCKET: bucket,
      S3_REGION: 'us-east-1',
      S3_ACCESS_KEY: S3_FAKE_CREDENTIALS.accessKeyId,
      S3_SECRET_KEY: S3_FAKE_CREDENTIALS.secretAccessKey,
      AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
    },
    close: () => fake.close(),
  };
}
