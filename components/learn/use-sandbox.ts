'use client';

import { useMemo, useState } from 'react';
import { computeOffsetTable, GeometryError, type BridgeDescription, type OffsetTable } from '@/lib/geometry';
import { DEFAULT_SANDBOX, sandboxBridge, type SandboxSettings } from '@/lib/scene-data/sandbox';

interface Built {
  table: OffsetTable;
  desc: BridgeDescription;
  settings: SandboxSettings;
}

/**
 * The sandbox deck for the sliders, recomputed by the engine on every change; when the engine
 * cannot build the deck asked for, the last one it could build stays in the picture.
 */
export function useSandbox() {
  const [settings, setSettings] = useState<SandboxSettings>(DEFAULT_SANDBOX);
  const desc = useMemo(() => sandboxBridge(settings), [settings]);
  const computed = useMemo(() => {
    try {
      return { table: computeOffsetTable(desc), error: null as string | null };
    } catch (err) {
      return { table: null, error: err instanceof GeometryError ? err.message : String(err) };
    }
  }, [desc]);
  const first = useMemo((): Built => {
    const d = sandboxBridge(DEFAULT_SANDBOX);
    return { table: computeOffsetTable(d), desc: d, settings: DEFAULT_SANDBOX };
  }, []);
  const [lastGood, setLastGood] = useState<Built>(first);
  if (computed.table && lastGood.desc !== desc) setLastGood({ table: computed.table, desc, settings });
  const shown = computed.table ? { table: computed.table, desc, settings } : lastGood;
  return { settings, setSettings, shown, error: computed.error };
}
