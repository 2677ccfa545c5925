import { withRole, ok } from '@/lib/api/with-role';
import { commitSurvey, listSurvey, surveyUploadSchema } from '@/lib/services/survey';

export const GET = withRole<{ id: string }>('signed-in', undefined, async ({ params }) => ok(await listSurvey(params.id)));

export const POST = withRole<{ id: string }, typeof surveyUploadSchema>(['engineer', 'inspector'], surveyUploadSchema, async ({ user, params, body }) =>
  ok(await commitSurvey(user, params.id, body), 201),
);
