// Object storage for site photos and documents through the S3 SDK: the local fake by default
// (path-style, loopback), any S3-compatible service or AWS itself by setting S3_* variables.
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { serviceConfig } from './serviceConfig';

const clients = new Map<string, S3Client>();
const bucketsChecked = new Set<string>();

function client(): { s3: S3Client; bucket: string; local: boolean } {
  const c = serviceConfig();
  const cacheKey = `${c.s3Endpoint}|${c.s3Region}|${c.s3AccessKeyId}`;
  let s3 = clients.get(cacheKey);
  if (!s3) {
    s3 = new S3Client({
      endpoint: c.s3Endpoint,
      region: c.s3Region,
      forcePathStyle: c.s3ForcePathStyle,
      credentials: { accessKeyId: c.s3AccessKeyId, secretAccessKey: c.s3SecretAccessKey },
      // Checksums only where the service requires them: keeps S3-compatible stores happy.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    });
    clients.set(cacheKey, s3);
  }
  return {
    s3,
    bucket: c.s3Bucket,
    local: !!c.s3Endpoint && /127\.0\.0\.1|localhost/.test(c.s3Endpoint),
  };
}

/** On a local store, creates the bucket on first use; real buckets are made by whoever runs them. */
async function ensureBucket(): Promise<void> {
  const { s3, bucket, local } = client();
  if (!local || bucketsChecked.has(bucket)) return;
  try {
    await s3.send(new HeadBucketCommand({ Bucket: bucket }));
  } catch {
    await s3.send(new CreateBucketCommand({ Bucket: bucket }));
  }
  bucketsChecked.add(bucket);
}

/** Stores bytes under `key`. */
export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  await ensureBucket();
  const { s3, bucket } = client();
  await s3.send(
    new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentType: contentType }),
  );
}

/** Reads the bytes under `key`; undefined when there is no such object. */
export async function getObject(
  key: string,
): Promise<{ body: Buffer; contentType: string } | undefined> {
  const { s3, bucket } = client();
  try {
    const res = await s3.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
    const bytes = await res.Body!.transformToByteArray();
    return { body: Buffer.from(bytes), contentType: res.ContentType ?? 'application/octet-stream' };
  } catch (err) {
    if ((err as { name?: string }).name === 'NoSuchKey') return undefined;
    throw err;
  }
}

export async function deleteObject(key: string): Promise<void> {
  const { s3, bucket } = client();
  await s3.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
}
