import { notFound } from 'next/navigation';
import { HttpError } from '@/lib/api/errors';
import { getBridge, listRevisions } from '@/lib/services/bridges';

/** The bridge and its revisions for the page; a missing bridge becomes the not-found page. */
export async function loadBridge(id: string) {
  try {
    const [bridge, revisions] = await Promise.all([getBridge(id), listRevisions(id)]);
    return { bridge, revisions };
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) notFound();
    throw err;
  }
}
