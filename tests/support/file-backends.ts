import fs from 'node:fs';
import path from 'node:path';
import { startFakeS3, type FakeS3 } from './fake-s3';

/** The two places attachment files can live; the attachment tests run once against each. */
export const FILE_BACKENDS = ['disk', 's3'] as const;
export type FileBackend = (typeof FILE_BACKENDS)[number];

/**
 * A look at the stored files from outside the app: the folders under DATA_DIR, or the fake S3
 * bucket through a client of the test's own. `uploads` are the stored uploads, `thumbs` the thumbnails.
 */
export type FileProbe = {
  names(area: 'uploads' | 'thumbs'): Promise<string[]>;
  read(area: 'uploads' | 'thumbs', name: string): Promise<Buffer | null>;
  clear(area: 'uploads' | 'thumbs'): Promise<void>;
};

const DISK_DIRS = { uploads: 'uploads', thumbs: path.join('cache', 'thumbs') };
const S3_PREFIXES = { uploads: 'uploads/', thumbs: 'cache/thumbs/' };

function diskProbe(): FileProbe {
  const dir = (area: 'uploads' | 'thumbs') => path.join(process.env.DATA_DIR as string, DISK_DIRS[area]);
  return {
    names: async (area) => (fs.existsSync(dir(area)) ? fs.readdirSync(dir(area)).sort() : []),
    read: async (area, name) => (fs.existsSync(path.join(dir(area), name)) ? fs.readFileSync(path.join(dir(area), name)) : null),
    clear: async (area) => fs.rmSync(dir(area), { recursive: true, force: true }),
  };
}

function s3Probe(s3: FakeS3): FileProbe {
  return {
    names: async (area) => (await s3.keys(S3_PREFIXES[area])).map((k) => k.slice(S3_PREFIXES[area].length)),
    read: (area, name) => s3.read(S3_PREFIXES[area] + name),
    clear: (area) => s3.clear(S3_PREFIXES[area]),
  };
}

/**
 * Points the app at the backend for the tests of one describe block: for 's3' starts a fake S3 server
 * and sets the S3_ variables; `stop` undoes it. For 'disk' nothing changes.
 */
export async function useFileBackend(backend: FileBackend): Promise<{ probe: FileProbe; stop(): Promise<void> }> {
  if (backend === 'disk') return { probe: diskProbe(), stop: async () => undefined };
  const s3 = await startFakeS3();
  Object.assign(process.env, s3.env);
  return {
    probe: s3Probe(s3),
    async stop() {
      for (const name of Object.keys(s3.env)) delete process.env[name];
      await s3.stop();
    },
  };
}
