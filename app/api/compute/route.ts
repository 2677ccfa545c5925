import { z } from 'zod';
import { withRole, ok } from '@/lib/api/with-role';
import { readQuery } from '@/lib/api/query';
import { computeFromJson, computeQuerySchema } from '@/lib/services/offsets';

// The description is checked by the engine's own schema inside computeFromJson.
// ?interior=1 adds the interior girders' rows (their overhang fields are null).
export const POST = withRole('signed-in', z.unknown(), async ({ req, body }) =>
  ok(computeFromJson(body, readQuery(req, computeQuerySchema))),
);
