import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import S3rver from 's3rver';
import { DeleteObjectCommand, GetObjectCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';

/** The settings the app reads (lib/config.ts objectStorageConfig) for a fake S3 server. */
export type S3Env = { S3_ENDPOINT: string; S3_BUCKET: string; S3_REGION: string; S3_ACCESS_KEY_ID: string; S3_SECRET_ACCESS_KEY: string; S3_FORCE_PATH_STYLE: string };

export type FakeS3 = {
  env: S3Env;
  /** Object keys under a prefix, read with a client of the test's own (not through the app's store). */
  keys(prefix: string): Promise<string[]>;
  /** An object's bytes, or null when there is none. */
  read(key: string): Promise<Buffer | null>;
  /** Deletes every object under a prefix. */
  clear(prefix: string): Promise<void>;
  stop(): Promise<void>;
};

/**
 * Starts s3rver (a fake S3 server from the npm registry, storing objects in a temp folder) on a free
 * loopback port with one empty bucket.
 */
export async function startFakeS3(): Promise<FakeS3> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-s3-'));
  const bucket = 'chordline-test';
  const server = new S3rver({ port: 0, address: '127.0.0.1', silent: true, directory: dir, configureBuckets: [{ name: bucket }] });
  const { port } = await server.run();
  // s3rver accepts any key pair; these are its documented defaults.
  const env: S3Env = {
    S3_ENDPOINT: `http://127.0.0.1:${port}`,
    S3_BUCKET: bucket,
    S3_REGION: 'us-east-1',
    S3_ACCESS_KEY_ID: 'S3RVER',
    S3_SECRET_ACCESS_KEY: 'S3RVER',
    S3_FORCE_PATH_STYLE: '1',
  };
  const client = new S3Client({
    endpoint: env.S3_ENDPOINT,
    region: env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const keys = async (prefix: string) => {
    const out = await client.send(new ListObjectsV2Command({ Bucket: bucket, Prefix: prefix }));
    return (out.Contents ?? []).map((o) => o.Key!).sort();
  };
  return {
    env,
    keys,
    async read(key) {
      try {
        const got = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
        return Buffer.from(await got.Body!.transformToByteArray());
      } catch (err) {
        if ((err as { name?: string }).name === 'NoSuchKey') return null;
        throw err;
      }
    },
    async clear(prefix) {
      for (const key of await keys(prefix)) await client.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
    },
    async stop() {
      client.destroy();
      await server.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
