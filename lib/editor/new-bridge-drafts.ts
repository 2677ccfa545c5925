/**
 * Starting drafts for a new bridge (pure; no React): the starter bridge, or a LandXML alignment and
 * profile with every other part of the description left blank for the engineer to fill in.
 */
import { starterBridge } from '@/lib/demo/starter-bridge';
import type { BridgeDescription } from '@/lib/geometry';
import type { ImportedAlignment } from '@/lib/import/landxml';
import { alignmentToDraft, pvisToDraft, toDraft, type Draft, type OffsetDraft } from './draft';
import type { Units } from '@/lib/units';

/** The draft of the built-in starter bridge in the given units. */
export function starterDraft(units: Units, name?: string): Draft {
  return toDraft(starterBridge(units, name) as BridgeDescription);
}

const blankOffset = (o: OffsetDraft): OffsetDraft => ({ ...o, magnitude: '' });

/** A deck edge left blank: one constant offset with no distance typed (a table of offsets is dropped). */
function blankEdge<E>(edge: E): E {
  const e = edge as unknown as Record<string, unknown>;
  if ('constant' in e) return { ...e, mode: 'constant', constant: blankOffset(e.constant as OffsetDraft), rows: [] } as E;
  return blankOffset(edge as unknown as OffsetDraft) as unknown as E;
}

/**
 * A draft whose alignment (and profile, when the file has one) comes from a LandXML import and whose
 * cross slopes, deck, bent stations and girder offsets are blank, so the editor asks for each of them.
 * The rows keep the starter bridge's shape (three bents, four girder lines, its cross-slope rows) as
 * a layout to fill in; rows can be added or removed in the editor.
 */
export function landXmlDraft(item: ImportedAlignment, units: Units, name: string): Draft {
  const base = starterDraft(units, name);
  return {
    ...base,
    name,
    alignment: { ...alignmentToDraft(item.alignment, units), rest: {} },
    pvis: item.profile ? pvisToDraft(item.profile.pvis, units) : base.pvis.map((p) => ({ ...p, station: '', elevation: '', curve_length: '' })),
    cross_slopes: base.cross_slopes.map((c) => ({ ...c, station: '', left: '', right: '' })),
    deck: {
      ...base.deck,
      left_edge_offset: blankEdge(base.deck.left_edge_offset),
      right_edge_offset: blankEdge(base.deck.right_edge_offset),
      slab_thickness: '',
      edge_thickness: '',
      left_barrier_width: '',
      right_barrier_width: '',
    },
    bents: base.bents.map((b) => ({ ...b, station: '' })),
    girders: base.girders.map((g) => ({ ...g, offsets: g.offsets.map(blankOffset) })),
  };
}
