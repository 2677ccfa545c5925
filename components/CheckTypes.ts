/** A check as GET/POST /api/bridges/[id]/checks return it (lengths in the bridge's units). */
export type CheckRow = {
  id: number;
  revision: number;
  span: number;
  girder: string;
  side: string;
  point: number;
  station: number;
  measured_edge_width: number | null;
  computed_edge_width: number | null;
  width_deviation: number | null;
  width_tolerance: number;
  width_pass: boolean | null;
  measured_drop_from_girder_top: number | null;
  computed_drop_from_girder_top: number | null;
  reading_deviation: number | null;
  reading_tolerance: number;
  reading_pass: boolean | null;
  pass: boolean;
  note: string;
  supersedes_id: number | null;
  superseded_by: number | null;
  by: string | null;
  created_at: string;
  photos: { id: number; name: string; content_type: string; url: string }[];
};

/** One bracket's targets as the field pages receive them from the server. */
export type BracketRow = {
  point: number;
  fraction: number;
  station: number;
  edge_width: number;
  edge_width_text: string;
  edge_width_decimal_text: string;
  form_target: number;
  top_of_girder: number | null;
  buildup: number | null;
  reading: number | null;
  girder_rod: number | null;
  form_rod: number | null;
  extra_rod: number | null;
};

export type BracketGroup = { span: number; girder: string; side: 'left' | 'right'; rows: BracketRow[] };
