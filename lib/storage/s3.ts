import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import type { ObjectStorageConfig } from '@/lib/config';
import { checkStoredName, type FileArea, type FileStore, type OpenedFile } from './types';

/** Object keys: the same layout as the data folder, so a bucket and a DATA_DIR read alike. */
function keyOf(area: FileArea, name: string): string {
  checkStoredName(area, name);
  return area === 'uploads' ? `uploads/${name}` : `cache/thumbs/${name}`;
}

function missing(err: unknown): boolean {
  const e = err as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e?.name === 'NoSuchKey' || e?.name === 'NotFound' || e?.$metadata?.httpStatusCode === 404;
}

/** The one body shape the SDK hands back in Node (a stream with the SDK's helpers mixed in). */
type SdkBody = { transformToByteArray(): Promise<Uint8Array>; transformToWebStream(): ReadableStream<Uint8Array> };

/**
 * Files in an S3-compatible bucket through the official SDK (@aws-sdk/client-s3). Checksums are sent
 * and checked only where the API requires them, so S3-compatible services that predate the SDK's
 * default CRC trailers (self-hosted stores, the test's s3rver) accept the requests.
 */
export function s3Store(config: ObjectStorageConfig): FileStore {
  const client = new S3Client({
    region: config.region,
    endpoint: config.endpoint,
    forcePathStyle: config.forcePathStyle,
    credentials: config.credentials,
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const Bucket = config.bucket;

  async function get(area: FileArea, name: string) {
    try {
      return await client.send(new GetObjectCommand({ Bucket, Key: keyOf(area, name) }));
    } catch (err) {
      if (missing(err)) return null;
      throw err;
    }
  }

  return {
    kind: 's3',
    describe: () => `bucket ${Bucket}${config.endpoint ? ` at ${config.endpoint}` : ''}`,

    async put(area, name, bytes, contentType) {
      await client.send(new PutObjectCommand({ Bucket, Key: keyOf(area, name), Body: bytes, ContentType: contentType, ContentLength: bytes.byteLength }));
    },

    async read(area, name) {
      const got = await get(area, name);
      if (!got?.Body) return null;
      return Buffer.from(await (got.Body as unknown as SdkBody).transformToByteArray());
    },

    async open(area, name): Promise<OpenedFile | null> {
      const got = await get(area, name);
      if (!got?.Body) return null;
      return { body: (got.Body as unknown as SdkBody).transformToWebStream(), size: Number(got.ContentLength ?? 0) };
    },

    async remove(area, name) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: keyOf(area, name) }));
    },
  };
}
