import { BRIDGE_DATA_CACHES } from '@/lib/sw/cache-names';
import { forgetAllBridges } from './kept-bridges';
import { LEGACY_PREFIX } from './legacy-queue';
import { clearUserItems } from './outbox';

/**
 * Signing out: deletes this user's unsent measurements and photos (the caller has asked first), every
 * kept bridge, and the cached pages, payloads, API answers and photos that hold bridge data. The app
 * shell (scripts, styles, fonts, icons) stays. Other people's unsent items stay for them.
 */
export async function clearPhoneForSignOut(userId: number): Promise<void> {
  await clearUserItems(userId).catch(() => 0);
  await forgetAllBridges().catch(() => undefined);
  try {
    for (let i = localStorage.length - 1; i >= 0; i--) {
      const k = localStorage.key(i);
      if (k && k.startsWith(LEGACY_PREFIX)) localStorage.removeItem(k);
    }
  } catch {
    // No localStorage: nothing kept there.
  }
  if (typeof caches !== 'undefined') await Promise.all(BRIDGE_DATA_CACHES.map((name) => caches.delete(name).catch(() => false)));
}
