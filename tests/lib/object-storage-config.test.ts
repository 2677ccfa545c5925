import { afterEach, describe, expect, it } from 'vitest';
import { objectStorageConfig } from '@/lib/config';

const NAMES = ['S3_BUCKET', 'S3_ENDPOINT', 'S3_REGION', 'S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY', 'S3_FORCE_PATH_STYLE'];
const saved = Object.fromEntries(NAMES.map((n) => [n, process.env[n]]));
const set = (values: Record<string, string>) => {
  for (const n of NAMES) delete process.env[n];
  Object.assign(process.env, values);
};

afterEach(() => {
  for (const n of NAMES) {
    if (saved[n] === undefined) delete process.env[n];
    else process.env[n] = saved[n];
  }
});

describe('object storage settings', () => {
  it('keeps files on disk when no S3_ variable is set', () => {
    set({});
    expect(objectStorageConfig()).toBeNull();
  });

  it('reads a full setting for a self-hosted store', () => {
    set({ S3_BUCKET: 'photos', S3_ENDPOINT: 'http://minio.example.test:9000', S3_ACCESS_KEY_ID: 'key', S3_SECRET_ACCESS_KEY: 'secret', S3_FORCE_PATH_STYLE: '1' });
    expect(objectStorageConfig()).toEqual({
      bucket: 'photos',
      endpoint: 'http://minio.example.test:9000',
      region: 'us-east-1',
      credentials: { accessKeyId: 'key', secretAccessKey: 'secret' },
      forcePathStyle: true,
    });
  });

  it('refuses a half-made setting instead of quietly keeping files on one server', () => {
    set({ S3_ENDPOINT: 'http://minio.example.test:9000', S3_ACCESS_KEY_ID: 'key', S3_SECRET_ACCESS_KEY: 'secret' });
    expect(() => objectStorageConfig()).toThrow(/without S3_BUCKET/);
    set({ S3_BUCKET: 'photos', S3_ACCESS_KEY_ID: 'key' });
    expect(() => objectStorageConfig()).toThrow(/both S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY/);
  });
});
