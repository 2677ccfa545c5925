import { z } from 'zod';
import { withRole, ok } from '@/lib/api/with-role';
import { computeFromJson } from '@/lib/services/offsets';

// The description is checked by the engine's own schema inside computeFromJson.
export const POST = withRole('signed-in', z.unknown(), async ({ body }) => ok(computeFromJson(body)));
