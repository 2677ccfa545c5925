/**
 * The offset table JSON the API returns (bridge-format "Output"). Kept here so the table view
 * reads exactly the contract's field names; lengths are in the table's `units`.
 */
export type OffsetPointRow = {
  span: number;
  girder: string;
  side: 'left' | 'right' | 'interior';
  point: number;
  fraction: number;
  station: number;
  offset: number;
  edge_station: number | null;
  edge_width: number | null;
  top_of_deck: number | null;
  bottom_of_slab: number | null;
  edge_bottom: number | null;
  edge_drop: number | null;
  form_target: number | null;
  top_of_girder: number | null;
  buildup: number | null;
  drop_from_girder_top: number | null;
};

export type ChordOffsetRow = { i: number; distance: number; offset: number };

export type ChordOffsetSetRow = {
  span: number;
  side: 'left' | 'right';
  chord_length: number;
  spaces: number;
  offsets: ChordOffsetRow[];
};

export type OffsetTableJson = {
  units: 'ft' | 'm';
  points: OffsetPointRow[];
  chord_offsets: ChordOffsetSetRow[];
};
