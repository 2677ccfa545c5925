/** The survey service's input schema and the shapes it answers with (lib/services/survey.ts). */
import { z } from 'zod';
import type { SurveyCsvRow } from '@/lib/import/survey-csv';
import type { Units } from '@/lib/units';

/** Largest survey CSV text accepted, in characters (the JSON body limit is 1 MB). */
export const MAX_SURVEY_CSV_CHARS = 900_000;

export const surveyUploadSchema = z.object({
  csv: z
    .string({ error: 'Send the CSV text in "csv".' })
    .min(1, 'The file is empty.')
    .max(MAX_SURVEY_CSV_CHARS, `The file is larger than ${Math.round(MAX_SURVEY_CSV_CHARS / 1000)} kB; split it.`),
  filename: z.string().trim().max(200, 'Keep the file name under 200 characters.').optional().default(''),
  /** The revision the preview was checked against; a commit on a newer revision is refused (409). */
  revision: z.number({ error: 'revision must be the revision number you previewed.' }).int().positive().optional(),
});
export type SurveyUpload = z.infer<typeof surveyUploadSchema>;

/** A checked row of the file, with the stored value it would replace (null when the point has none yet). */
export type SurveyPreviewRow = SurveyCsvRow & { replaces: number | null };

export type SurveyPreview = {
  bridge_id: number;
  revision: number;
  units: Units;
  header: boolean;
  /** The cell separator found in the file, in words: "commas", "semicolons" or "tabs". */
  delimiter: string;
  /** True when decimal commas were read as decimal points (files separated by semicolons or tabs). */
  decimal_comma: boolean;
  file_problems: string[];
  rows: SurveyPreviewRow[];
  summary: { rows: number; good: number; bad: number; replacing: number };
};

export type SurveyValue = {
  girder: string;
  span: number;
  point: number;
  elevation: number;
  imported_by: string | null;
  imported_at: string;
  /** Points per span of the revision the value was surveyed on: `point` counts in these divisions. */
  points_per_span: number;
  /**
   * The same place as a point of the current revision's division, or null when it is no longer a
   * girder point there (the value is then left out of the table).
   */
  point_on_current_revision: number | null;
  /** Earlier values of the same point, newest first. */
  history: { elevation: number; imported_by: string | null; imported_at: string; replaced_at: string }[];
};

export type SurveyImportSummary = { id: number; filename: string; revision: number; rows: number; replaced: number; imported_by: string | null; imported_at: string };

export type SurveyListing = {
  bridge_id: number;
  revision: number;
  units: Units;
  /** Points per span of the current revision. */
  points_per_span: number;
  values: SurveyValue[];
  imports: SurveyImportSummary[];
};
