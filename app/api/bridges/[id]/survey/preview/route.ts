import { withRole, ok } from '@/lib/api/with-role';
import { previewSurvey, surveyUploadSchema } from '@/lib/services/survey';

/** Checks a survey CSV row by row and writes nothing. */
export const POST = withRole<{ id: string }, typeof surveyUploadSchema>(['engineer', 'inspector'], surveyUploadSchema, async ({ params, body }) => ok(await previewSurvey(params.id, body)));
