import { notFound } from 'next/navigation';
import { NotFoundError } from '@/lib/errors';
import { getBridge, listRevisions } from '@/lib/services/bridges';

/** Awaits a read for a bridge page; "no such bridge" (404) becomes the not-found page. */
export async function orNotFound<T>(work: Promise<T>): Promise<T> {
  try {
    return await work;
  } catch (err) {
    if (err instanceof NotFoundError) notFound();
    throw err;
  }
}

/** The bridge and its revisions for the page; a missing bridge becomes the not-found page. */
export async function loadBridge(id: string) {
  const [bridge, revisions] = await orNotFound(Promise.all([getBridge(id), listRevisions(id)]));
  return { bridge, revisions };
}
