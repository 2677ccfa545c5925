import path from 'node:path';

/** Folder for the SQLite file, uploads, the local outbox and generated secrets. Read at call time so tests can point it at a temp folder. */
export function dataDir(): string {
  return path.resolve(/*turbopackIgnore: true*/ process.env.DATA_DIR || './data');
}

/** True when DATABASE_URL selects PostgreSQL instead of the SQLite file in the data folder. */
export function usesPostgres(): boolean {
  return /^postgres(ql)?:\/\//.test(process.env.DATABASE_URL ?? '');
}

/** The demo seed runs on an empty database unless CHORDLINE_NO_DEMO=1. */
export function demoSeedEnabled(): boolean {
  return process.env.CHORDLINE_NO_DEMO !== '1';
}

/** Object storage settings: where photos, PDFs and thumbnails live when S3_BUCKET is set. */
export type ObjectStorageConfig = {
  bucket: string;
  /** S3_ENDPOINT: the service's URL (MinIO, Ceph, a cloud's S3-compatible endpoint); unset for AWS itself. */
  endpoint: string | undefined;
  region: string;
  /** S3_ACCESS_KEY_ID / S3_SECRET_ACCESS_KEY; unset to use the SDK's own chain (instance role, AWS_* variables). */
  credentials: { accessKeyId: string; secretAccessKey: string } | undefined;
  /** S3_FORCE_PATH_STYLE=1: bucket in the path (http://host/bucket/key), as most self-hosted services need. */
  forcePathStyle: boolean;
};

/**
 * The object storage settings, or null when files stay on the local disk (DATA_DIR/uploads). Read at
 * call time. A half-made setting (an S3_ variable without S3_BUCKET, a key without its secret) is an
 * error rather than a quiet fall-back to disk: on several servers that would scatter the photos.
 */
export function objectStorageConfig(): ObjectStorageConfig | null {
  const env = (name: string) => (process.env[name] ?? '').trim() || undefined;
  const bucket = env('S3_BUCKET');
  const accessKeyId = env('S3_ACCESS_KEY_ID');
  const secretAccessKey = env('S3_SECRET_ACCESS_KEY');
  if (!bucket) {
    const stray = ['S3_ENDPOINT', 'S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY'].filter((n) => env(n));
    if (stray.length) throw new Error(`${stray.join(', ')} set without S3_BUCKET: set S3_BUCKET to keep files in object storage, or unset them to keep files on disk.`);
    return null;
  }
  if (Boolean(accessKeyId) !== Boolean(secretAccessKey)) throw new Error('Set both S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY, or neither.');
  return {
    bucket,
    endpoint: env('S3_ENDPOINT'),
    region: env('S3_REGION') ?? 'us-east-1',
    credentials: accessKeyId && secretAccessKey ? { accessKeyId, secretAccessKey } : undefined,
    forcePathStyle: /^(1|true|yes)$/i.test(env('S3_FORCE_PATH_STYLE') ?? ''),
  };
}
