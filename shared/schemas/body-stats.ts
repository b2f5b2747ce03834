import { z } from 'zod';
import { estimateTargetsSchema } from './targets';

export const BODY_UNITS = ['us', 'metric'] as const;
export type BodyUnits = (typeof BODY_UNITS)[number];

/**
 * A client's body stats as the coach last estimated with them (PUT /api/clients/:id/body-stats):
 * the estimate's input in cm and kg, and the units the coach typed them in.
 */
export const bodyStatsSchema = estimateTargetsSchema.extend({
  units: z.enum(BODY_UNITS, { message: 'units must be us or metric.' }),
});
export type BodyStats = z.infer<typeof bodyStatsSchema>;

/** GET /api/clients/:id/body-stats: null until the coach has estimated once. */
export interface BodyStatsResponse {
  clientId: number;
  stats: BodyStats | null;
  updatedAt: string | null;
}
