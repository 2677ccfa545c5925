import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { BracketGroup, CheckRow } from '@/components/checks/check-types';
import type { Units } from '@/lib/units';

/** Field settings as kept on the phone (bridge units). */
export type KeptTolerances = { width: number; reading: number; base_rod_length: number };

/**
 * A bridge kept on this phone for field mode without a connection: what field mode shows, as it was
 * when the user pressed "Keep on this phone" (or last opened field mode online afterwards).
 */
export type KeptBridge = {
  id: number;
  name: string;
  revision: number;
  units: Units;
  /** Field targets: the exterior girders' bracket rows, by span and girder. */
  groups: BracketGroup[];
  /** The offset table of that revision as GET /api/bridges/:id/offsets gave it. */
  offsets: unknown;
  tolerances: KeptTolerances;
  /** The latest checks, newest first, as GET /api/bridges/:id/checks gave them. */
  checks: CheckRow[];
  /** ISO time the copy was saved. */
  savedAt: string;
  /** The user who kept it. */
  userId: number;
};

/** What every waiting item carries: who took it, when, and how sending went so far. */
type OutboxBase = {
  /** Order taken (the store's own counter); sending follows it. */
  seq?: number;
  /** Client key: the server records an item once however often it is sent. */
  key: string;
  bridgeId: number;
  userId: number;
  userEmail: string;
  takenAt: string;
  attempts: number;
  /** Last failure, for the screen ("no connection", "signed out"). */
  lastError: string | null;
};

/** The measurement part of POST /api/bridges/:id/checks (bridge units). */
export type CheckBody = {
  span: number;
  girder: string;
  point: number;
  measured_edge_width: number | null;
  measured_drop_from_girder_top: number | null;
  note: string;
};

/** A measurement waiting to be sent, with the revision whose targets it was measured against. */
export type OutboxCheck = OutboxBase & { kind: 'check'; revision: number | null; body: CheckBody };

/** A photo (already made small on the phone) waiting for its check to reach the server. */
export type OutboxPhoto = OutboxBase & {
  kind: 'photo';
  blob: Blob;
  name: string;
  /** The check it belongs to: by server id when that check was already saved, else by client key. */
  checkId: number | null;
  checkKey: string | null;
  /** Where the photo was taken, for the screen. */
  span: number;
  girder: string;
  point: number;
};

export type OutboxItem = OutboxCheck | OutboxPhoto;

interface OfflineSchema extends DBSchema {
  bridges: { key: number; value: KeptBridge };
  outbox: { key: number; value: OutboxItem; indexes: { 'by-key': string; 'by-bridge': number; 'by-user': number } };
}

export type OfflineDb = IDBPDatabase<OfflineSchema>;

export const DB_NAME = 'chordline-offline';

let opening: Promise<OfflineDb> | null = null;

/** Opens (creating on first use) the phone's offline store. One connection per page. */
export function offlineDb(): Promise<OfflineDb> {
  if (!opening) {
    opening = openDB<OfflineSchema>(DB_NAME, 1, {
      upgrade(db) {
        db.createObjectStore('bridges', { keyPath: 'id' });
        const outbox = db.createObjectStore('outbox', { keyPath: 'seq', autoIncrement: true });
        outbox.createIndex('by-key', 'key', { unique: true });
        outbox.createIndex('by-bridge', 'bridgeId');
        outbox.createIndex('by-user', 'userId');
      },
      blocking() {
        // A newer version of the app wants to upgrade the store: let it.
        void opening?.then((db) => db.close());
        opening = null;
      },
    }).catch((err) => {
      opening = null;
      throw err;
    });
  }
  return opening;
}

/** Forgets the open connection (tests delete the database between cases). */
export async function closeOfflineDb(): Promise<void> {
  const db = opening;
  opening = null;
  if (db) (await db).close();
}
