import type { LineFunction } from '../culinary/types';
import type { Nutrients } from '../nutrition';

/** Why a candidate is offered: the substitution rule behind it. */
export interface RuleRef {
  /** stable id of the rule in data/substitution-rules.json, e.g. "ground-beef-to-lean-turkey" */
  id: string;
  /** what the cook reads: "lean ground turkey for 80/20 beef, 1:1 by weight" */
  label: string;
  /** one line: why it works in this dish */
  why: string;
  /** the cook's note shown with the change ("bake 5 minutes longer so the lower-fat cheese melts") */
  note?: string;
  cautions?: string[];
}

/** A coach's approval of a swap, with an optional cooking note and volume ratio. */
export interface SwapApproval {
  /** who approved it (the coach's display name or id) */
  by: string;
  note?: string;
  /** mL of the swap per mL of the original food; the band is centred on V·ratio (used when massRatio is absent) */
  volumeRatio?: number;
  /** grams of the swap per gram of the original food; wins over the candidate's own massRatio */
  massRatio?: number;
}

/** One food a line may use: the original food or a substitute a rule or a coach offers. */
export interface Candidate {
  foodId: number;
  name: string;
  /** where the food comes from: a catalogue name is turned into the cook's words, a cook's own food keeps its name; absent, the name is used as it is */
  source?: 'usda-sr28' | 'custom';
  /** ρ, grams per mL (for the whole-dish volume check) */
  densityGPerMl: number;
  per100g: Nutrients;
  /** the food the recipe was written with; exactly one candidate per line carries it */
  original?: boolean;
  approved?: SwapApproval;
  /**
   * grams of this food per gram of the line's written food at the rule's amount; the band is
   * (1−a)·massRatio·G … (1+a)·massRatio·G. Absent: the approval's massRatio, else its volumeRatio
   * turned into grams with both densities, else 1 (equal weight).
   */
  massRatio?: number;
  /** the largest share of the written grams this candidate may replace (default 1, the whole line) */
  maxShare?: number;
  /** the candidate may share the line with the original food (implied by maxShare < 1) */
  partial?: boolean;
  /**
   * the rule's own band [lo, hi] on grams, as factors of massRatio·s·G (lo ≤ 1 ≤ hi): a tight
   * [0.9, 1.1] for 1:1 liquids and starches, up to ×1.5 for more of a lean main protein. It replaces
   * the request's line tolerance for this candidate; a coach's approved swap keeps the line tolerance.
   */
  band?: [number, number];
  rule?: RuleRef;
}

export interface RewriteLine {
  /** the line's position in the recipe, used in the explanation */
  index: number;
  foodId: number;
  grams: number;
  /** V_i, the line's volume as written (mL) */
  volumeMl: number;
  /** a locked line stays exactly as written */
  locked: boolean;
  candidates: Candidate[];
  /** what the line does in the dish (shared/culinary); read only for explanations */
  role?: LineFunction;
  /** factors of the written grams the original food may take when it is not swapped; absent = exactly as written */
  keepScale?: [number, number];
  /** why the line is held as written; a held line keeps its original food and grams */
  heldReason?: string;
  /** the food as the cook's line names it ("pancetta"), for the explanation; absent = the food's common name */
  writtenName?: string;
}

/** Per-serving targets. */
export interface Targets {
  proteinMinG: number;
  kcalMax: number;
  fiberMinG?: number;
  fatMaxG?: number;
  satFatMaxG?: number;
  sodiumMaxMg?: number;
  sugarMaxG?: number;
}

export type TargetName = keyof Targets;

export type RewriteObjective = 'closest' | 'max-protein' | 'min-kcal';

export interface RewriteOptions {
  /** t, whole-dish volume tolerance in percent (default 10) */
  volumeTolerancePct?: number;
  /** a, per-line volume tolerance in percent (default 25) */
  lineTolerancePct?: number;
  /** M, the most swaps allowed; no limit when absent */
  maxSwaps?: number;
  /** default 'closest' */
  objective?: RewriteObjective;
  /** include the solved model as CPLEX LP text in the result */
  explain?: boolean;
  /**
   * wall-clock budget for all the solves of one rewrite, ms (default 2000); a plan found when it
   * runs out is returned with solver.provenOptimal false
   */
  timeoutMs?: number;
  /** drop candidates that can never be needed (default true) */
  pruneDominated?: boolean;
}

export interface FoodRef {
  foodId: number;
  name: string;
}

/** One food of a plan's line; a partially swapped line has two, with the same index (original first). */
export interface PlanLine {
  index: number;
  food: FoodRef;
  grams: number;
  volumeMl: number;
  nutrients: Nutrients;
}

export interface Plan {
  lines: PlanLine[];
  totals: Nutrients;
  perServing: Nutrients;
  volumeMl: number;
}

/** What a change is for: a target it moves toward, the dish's volume, or the chosen objective. */
export type ChangePurpose = TargetName | 'volume' | 'objective';

export interface Change {
  line: number;
  from: FoodRef;
  to: FoodRef;
  gramsBefore: number;
  gramsAfter: number;
  swapped: boolean;
  /** the line is shared between the original food (keptGrams) and the substitute */
  partial?: boolean;
  /** the original food's remaining grams in a partial swap */
  keptGrams?: number;
  rule?: RuleRef;
  approvedBy?: string;
  /** the coach's note for an approved swap, else the rule's note for the cook */
  note?: string;
  serves: ChangePurpose[];
  reason: string;
}

/** A line held as written, and why. */
export interface HeldLine {
  line: number;
  reason: string;
}

export interface SolverInfo {
  /** the objective the answer optimises: the cook's, or a nutrient one found faster when time ran out */
  objective: RewriteObjective;
  /** its value for the plan ('closest': weighted swaps and volume change; else per serving) */
  objectiveValue: number;
  /** wall-clock time of every solve made for this answer */
  ms: number;
  solves: number;
  /** false when a solve ran into its time budget and kept its best plan found so far */
  provenOptimal: boolean;
  /** the model solved for the answer, in CPLEX LP text (with `explain`) */
  model?: string;
}

/** A change to the request that makes the targets reachable, each found by a re-solve. */
export interface Suggestion {
  kind: 'more-swaps' | 'target' | 'targets' | 'volume-tolerance';
  /** kind 'target': the target to move */
  target?: TargetName;
  /** swaps allowed in all, the target's new value, or the dish-volume tolerance in %; for 'targets' the number of targets moved */
  value: number;
  /** kind 'targets': several targets at once, at values the closest plan reaches */
  targets?: Partial<Targets>;
  message: string;
}

export interface OptimalRewrite {
  status: 'optimal';
  before: Plan;
  after: Plan;
  changes: Change[];
  held?: HeldLine[];
  solver: SolverInfo;
}

export interface InfeasibleRewrite {
  status: 'infeasible';
  message: string;
  before: Plan;
  /** the plan closest to the targets (weighted relative shortfall) */
  closest: Plan;
  bestReachable: Nutrients;
  binding: TargetName[];
  suggestions: Suggestion[];
  held?: HeldLine[];
  solver: SolverInfo;
}

export type RewriteResult = OptimalRewrite | InfeasibleRewrite;
