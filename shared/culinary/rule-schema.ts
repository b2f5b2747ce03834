import { z } from 'zod';
import { LINE_KINDS } from './line-kind';
import { DISH_CONTEXTS, DISH_TYPES, LINE_FUNCTIONS, type DishContext, type DishType, type LineFunction } from './types';

const ndb = z.string().regex(/^\d{5}$/, { message: 'an NDB number has five digits' });

/** A regular expression written as a string; checked to compile. */
const pattern = z.string().refine(
  (s) => {
    try {
      new RegExp(s, 'i');
      return true;
    } catch {
      return false;
    }
  },
  { message: 'not a valid regular expression' },
);

/** The food class a rule starts from: every field given must hold. */
export const foodClassSchema = z
  .object({
    /** exact NDB numbers (any of them) */
    ndb: z.array(ndb).min(1).optional(),
    /** SR28 food groups (two digits) */
    groups: z
      .array(z.string().regex(/^\d{2}$/))
      .min(1)
      .optional(),
    /** the readable catalogue name must match (case-insensitive) */
    name: pattern.optional(),
    /** … and must not match */
    notName: pattern.optional(),
    /** the line's written food phrase must match ("pancetta" read as bacon) */
    phrase: pattern.optional(),
    notPhrase: pattern.optional(),
    /** catalogue roles, any of them (for custom foods too) */
    roles: z.array(z.string()).min(1).optional(),
    /** fat per 100 g at least this (full-fat minces) */
    minFatG: z.number().min(0).optional(),
    /** fat per 100 g at most this (lean proteins) */
    maxFatG: z.number().min(0).optional(),
  })
  .refine((c) => c.ndb || c.groups || c.name || c.roles || c.phrase, { message: 'a food class needs ndb, groups, name, phrase or roles' });
export type FoodClass = z.infer<typeof foodClassSchema>;

export const ruleTargetSchema = z.union([
  z.object({
    ndb,
    /** the start of the target's readable SR28 name, checked when the rules load */
    name: z.string().min(3),
  }),
  /** the cook's own (or their coach's) custom foods labelled with this catalogue role */
  z.object({ ownFoodRole: z.string().min(2) }),
]);
export type RuleTarget = z.infer<typeof ruleTargetSchema>;

/** One piece of the written food → `count` pieces of the target, both from SR28 household portions. */
export const perPieceSchema = z.object({
  /** the reference food whose portion defines one piece of the original (1 large egg: 01123) */
  fromNdb: ndb,
  /** the portion's measure word(s), matched at the start of the SR28 measure text ("large", "slice") */
  fromMeasure: z.string().min(1),
  /** the target's portion measure ("large" egg white, "cup" of egg substitute) */
  toMeasure: z.string().min(1),
  /** how many of the target's measure per piece (2 whites per egg; 0.25 cup of substitute) */
  count: z.number().positive(),
});
export type PerPiece = z.infer<typeof perPieceSchema>;

export const quantitySchema = z.union([z.object({ massRatio: z.number().positive().max(4) }), z.object({ perPiece: perPieceSchema })]);

const functionEnum = z.enum(LINE_FUNCTIONS as [LineFunction, ...LineFunction[]]);
const contextEnum = z.enum(DISH_CONTEXTS as [DishContext, ...DishContext[]]);
const dishEnum = z.enum(DISH_TYPES as [DishType, ...DishType[]]);

export const substitutionRuleSchema = z
  .object({
    id: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, { message: 'a rule id is kebab-case' }),
    /** what the cook reads: "lean ground turkey for 80/20 beef, 1:1 by weight" */
    label: z.string().min(5),
    why: z.string().min(10),
    /** a published source, or "common practice" */
    source: z.string().min(3),
    from: foodClassSchema,
    /** line functions the rule applies to; any function when absent */
    functions: z.array(functionEnum).min(1).optional(),
    /** kinds of line the recipe must have, all of them ("crumbs", "egg", "meat": a breaded cutlet) */
    recipeHas: z.array(z.enum(LINE_KINDS)).min(1).optional(),
    /** kinds of line the recipe must not have ("yeast": oat flour has no gluten to raise a bread) */
    recipeLacks: z.array(z.enum(LINE_KINDS)).min(1).optional(),
    /**
     * whether the recipe browns raw meat or fish in its pan (DishReading.browsMeat): false — the rule
     * does not hold then (brushing a griddle is too little fat to brown mince); true — only then
     */
    browning: z.boolean().optional(),
    /** true: holds only where the recipe's noodles or rice are tossed with soy, oyster or fish sauce (DishReading.wokSauce) */
    stirFried: z.boolean().optional(),
    /** dish types the rule applies to; any when absent */
    dishTypes: z.array(dishEnum).min(1).optional(),
    contexts: z
      .object({
        /** the rule holds only in these contexts; a bake ('baked-batter-dough') must be named here to be allowed */
        works: z.array(contextEnum).min(1).optional(),
        /** the rule fails here ("yogurt splits in a boiled sauce") */
        fails: z.array(contextEnum).optional(),
      })
      .default({}),
    targets: z.array(ruleTargetSchema).default([]),
    quantity: quantitySchema.optional(),
    /** the largest share of the written grams a target may replace */
    maxShare: z.number().gt(0).max(1).default(1),
    /** a target may share the line with the original food */
    partial: z.boolean().default(false),
    /** factors the ORIGINAL food may take when it is not swapped ("less oil for sautéing") */
    keepScale: z.tuple([z.number().gt(0).max(1), z.number().min(1).max(2)]).optional(),
    /**
     * the targets' grams as factors [lo, hi] of ratio × the grams replaced, instead of the request's
     * line tolerance: a tight [0.9, 1.1] for 1:1 liquids, starches and meats
     */
    band: z.tuple([z.number().gt(0).max(1), z.number().min(1).max(2)]).optional(),
    /** holds only on the main protein of a mixed dish (not one shaped or breaded into the portion) */
    mixedDishOnly: z.boolean().default(false),
    /**
     * on the main protein of a mixed dish (a casserole, pie filling, pasta, stir-fry, chili, taco filling)
     * the lean targets may go up to this × ratio: a lighter dish carries more lean meat
     */
    moreInMixedDish: z.number().gt(1).max(1.5).optional(),
    cautions: z.array(z.string().min(3)).optional(),
    note: z.string().min(3).optional(),
  })
  .refine((r) => r.targets.length > 0 || r.keepScale, { message: 'a rule needs targets or keepScale' })
  .refine((r) => r.targets.length === 0 || r.quantity, { message: 'a rule with targets needs a quantity' });
export type SubstitutionRule = z.infer<typeof substitutionRuleSchema>;

export const ruleFileSchema = z.object({
  _note: z.string().optional(),
  rules: z.array(substitutionRuleSchema).min(1),
});

/** Parses data/substitution-rules.json; throws naming the rule and the field. */
export function parseRuleFile(json: unknown): SubstitutionRule[] {
  const parsed = ruleFileSchema.safeParse(json);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new Error(`substitution rules: ${issue.path.join('.')}: ${issue.message}`);
  }
  const ids = new Set<string>();
  for (const r of parsed.data.rules) {
    if (ids.has(r.id)) throw new Error(`substitution rules: duplicate id ${r.id}`);
    ids.add(r.id);
  }
  return parsed.data.rules;
}
