import { objectStorageConfig } from '@/lib/config';
import { diskStore } from './disk';
import { s3Store } from './s3';
import type { FileStore } from './types';

export type { FileArea, FileStore, OpenedFile } from './types';

let cached: { key: string; store: FileStore } | null = null;

/**
 * The store attachments go to: an S3-compatible bucket when S3_BUCKET is set (see
 * `objectStorageConfig` in lib/config.ts), else the local disk under DATA_DIR. The settings are read on
 * each call and one client is kept per setting, so tests can switch between the two.
 */
export function fileStore(): FileStore {
  const config = objectStorageConfig();
  if (!config) return diskStore;
  const key = JSON.stringify(config);
  if (cached?.key !== key) cached = { key, store: s3Store(config) };
  return cached.store;
}
