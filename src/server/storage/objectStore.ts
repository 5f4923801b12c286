// Private object storage over the S3 API (@aws-sdk/client-s3). In development and tests the endpoint is the
// local s3rver fake that npm start / npm test run on loopback; objects are never public: the app proxies them.
import { DeleteObjectCommand, GetObjectCommand, ListObjectsV2Command, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { S3_ACCESS_KEY, S3_BUCKET, S3_ENDPOINT, S3_REGION, S3_SECRET_KEY } from 'astro:env/server';

const client = new S3Client({
  region: S3_REGION,
  ...(S3_ENDPOINT !== undefined && { endpoint: S3_ENDPOINT, forcePathStyle: true }),
  ...(S3_ACCESS_KEY !== undefined && S3_SECRET_KEY !== undefined && { credentials: { accessKeyId: S3_ACCESS_KEY, secretAccessKey: S3_SECRET_KEY } }),
});

export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  await client.send(new PutObjectCommand({ Bucket: S3_BUCKET, Key: key, Body: body, ContentType: contentType }));
}

/** The object's bytes, or null when it does not exist. */
export async function getObject(key: string): Promise<Uint8Array | null> {
  try {
    const out = await client.send(new GetObjectCommand({ Bucket: S3_BUCKET, Key: key }));
    return out.Body ? await out.Body.transformToByteArray() : null;
  } catch (error) {
    if (error instanceof Error && (error.name === 'NoSuchKey' || error.name === 'NotFound')) return null;
    throw error;
  }
}

export async function deleteObject(key: string): Promise<void> {
  await client.send(new DeleteObjectCommand({ Bucket: S3_BUCKET, Key: key }));
}

export interface StoredObject {
  key: string;
  lastModified: Date;
}

/** Every object under `prefix`, one page (up to 1000) at a time. */
export async function* listObjectPages(prefix: string): AsyncGenerator<StoredObject[]> {
  let token: string | undefined;
  do {
    const out = await client.send(new ListObjectsV2Command({ Bucket: S3_BUCKET, Prefix: prefix, ...(token !== undefined && { ContinuationToken: token }) }));
    const page = (out.Contents ?? []).flatMap((o) => (o.Key && o.LastModified ? [{ key: o.Key, lastModified: o.LastModified }] : []));
    if (page.length > 0) yield page;
    token = out.IsTruncated ? out.NextContinuationToken : undefined;
  } while (token !== undefined);
}
