'use client';

import Link from 'next/link';
import type { KeptBridge } from '@/components/offline/offline-db';
import { savedTimeText } from './keep-for-field';

type Props = {
  bridge: { id: number; name: string; revision: number };
  online: boolean;
  kept: KeptBridge | null;
  /** The numbers on screen come from the kept copy. */
  fromPhone: boolean;
  /** This user's measurements and photos not yet on the server. */
  waiting: number;
  /** The earlier checks could not be loaded. */
  checksFailed: boolean;
};

/** Where the screen's numbers come from, in a few words: "offline · saved 07:42 · revision 3". */
function sourceLine({ bridge, online, kept, fromPhone }: Pick<Props, 'bridge' | 'online' | 'kept' | 'fromPhone'>): string {
  if (fromPhone && kept) return `offline · saved ${savedTimeText(kept.savedAt)} · revision ${kept.revision}`;
  if (!online) return `offline · revision ${bridge.revision} as last loaded`;
  return `Field mode · revision ${bridge.revision}`;
}

/** Field mode's header: back to the checks, the bridge, where the numbers come from, what waits to be sent. */
export default function FieldHeader({ bridge, online, kept, fromPhone, waiting, checksFailed }: Props) {
  const badge = waiting ? `${waiting} waiting` : !online || checksFailed ? 'Offline' : 'All sent';
  return (
    <header className="flex items-center gap-3 bg-brand-800 px-4 py-3 text-white">
      <Link href={`/bridges/${bridge.id}/checks`} className="rounded-md px-2 py-1 text-sm font-semibold text-brand-100 hover:bg-brand-700" aria-label="Leave field mode, go to the check history">
        ◀ Checks
      </Link>
      <div className="min-w-0 flex-1">
        <h1 className="truncate text-base font-bold leading-tight">{bridge.name}</h1>
        <p className="text-xs text-brand-100" data-testid="field-source">
          {sourceLine({ bridge, online, kept, fromPhone })}
        </p>
      </div>
      <p
        role="status"
        aria-live="polite"
        data-testid="field-waiting"
        className={`shrink-0 rounded-full px-3 py-1 text-xs font-bold ${waiting ? 'bg-caution-100 text-caution-700' : 'bg-brand-700 text-brand-50'}`}
        title={
          waiting ? 'Measurements and photos kept on this phone; they go to the server by themselves when the connection allows.' : 'Every measurement recorded on this phone has reached the server.'
        }
      >
        {badge}
      </p>
    </header>
  );
}
