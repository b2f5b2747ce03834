import { z } from 'zod';
import { MAX_LINES, servingsSchema } from './analyze';
import { targetsSchema } from './rewrite';
import { VERSION_KINDS } from './recipes';

/**
 * Hearthswap's own terms in an exported schema.org Recipe (JSON-LD). The schema.org fields carry the
 * latest (or chosen) version for any other reader; `hearthswap:versions` carries every version line by
 * line with the food and grams the cook settled on, so an import rebuilds the recipe exactly.
 * Documented in DEVELOPERS.md ("Recipe files").
 */
export const HEARTHSWAP_PREFIX = 'hearthswap';
export const HEARTHSWAP_NS = 'urn:hearthswap:terms#';
export const JSONLD_CONTEXT = ['https://schema.org', { [HEARTHSWAP_PREFIX]: HEARTHSWAP_NS }] as const;

/** A food named so another database can find it: SR28 foods by NDB number, label foods by name. */
export const exportedFoodSchema = z.object({
  'hearthswap:source': z.enum(['usda-sr28', 'custom']),
  'hearthswap:sourceId': z.string().max(40),
  name: z.string().max(500),
});

export const exportedLineSchema = z.object({
  'hearthswap:text': z.string().max(1_000),
  'hearthswap:food': exportedFoodSchema.nullable(),
  'hearthswap:grams': z.number().min(0).max(100_000),
  'hearthswap:warnings': z.array(z.string().max(1_000)).max(20).optional(),
  'hearthswap:checkMatch': z.boolean().optional(),
});
export type ExportedLine = z.infer<typeof exportedLineSchema>;

export const exportedVersionSchema = z.object({
  'hearthswap:number': z.number().int().min(1),
  'hearthswap:kind': z.enum(VERSION_KINDS),
  'hearthswap:parentNumber': z.number().int().min(1).nullable(),
  'hearthswap:servings': servingsSchema,
  'hearthswap:note': z.string().max(2_000),
  'hearthswap:targets': targetsSchema.nullable(),
  'hearthswap:lines': z.array(exportedLineSchema).min(1).max(MAX_LINES),
});
export type ExportedVersion = z.infer<typeof exportedVersionSchema>;

export const exportedVersionsSchema = z.array(exportedVersionSchema).min(1).max(200);
