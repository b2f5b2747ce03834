/**
 * POST /api/rewrite as the client reads it. The solver's own types (shared/rewrite/types.ts) name
 * foods by id only; the server answers with the catalogue's food summary in their place.
 */
import type { Nutrients } from '../../../shared/nutrition';
import type { ChangePurpose, HeldLine, RuleRef, SolverInfo, Suggestion, TargetName } from '../../../shared/rewrite/types';
import type { FoodSummary } from '../../../shared/schemas/analyze';
import { isApiError } from '../../lib/api-client';

/** One food of a plan's line; a shared line (part original, part substitute) has two with the same index. */
export interface RewritePlanLine {
  /** the line's position in the recipe as sent */
  index: number;
  food: FoodSummary;
  grams: number;
  volumeMl: number;
  nutrients: Nutrients;
}

export interface RewritePlan {
  lines: RewritePlanLine[];
  totals: Nutrients;
  perServing: Nutrients;
  volumeMl: number;
}

export interface RewriteChange {
  line: number;
  from: FoodSummary;
  to: FoodSummary;
  gramsBefore: number;
  gramsAfter: number;
  swapped: boolean;
  approvedBy?: string;
  /** the coach's note for an approved swap, else the rule's note */
  note?: string;
  serves: ChangePurpose[];
  reason: string;
  /** the line is shared: `from` keeps keptGrams, `to` takes gramsAfter */
  partial?: boolean;
  keptGrams?: number;
  /** the substitution rule behind the swap */
  rule?: RuleRef;
}

/** A line the rewrite left out: no food matched, or no amount. */
export interface SkippedLine {
  line: number;
  input: string;
  reason: string;
}

export interface RewriteAnswer {
  status: 'optimal';
  before: RewritePlan;
  after: RewritePlan;
  changes: RewriteChange[];
  /** lines kept exactly as written because of what they do in the dish */
  held?: HeldLine[];
  skippedLines: SkippedLine[];
  solver: SolverInfo;
}

/** The details of a 422 `infeasible`: how close the dish can get, and what would make it reachable. */
export interface InfeasibleDetails {
  bestReachable: Nutrients;
  binding: TargetName[];
  suggestions: Suggestion[];
  before: RewritePlan;
  closest: RewritePlan;
  held: HeldLine[];
  skippedLines: SkippedLine[];
  solver?: SolverInfo;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** The infeasible details of a failed rewrite, or null when the error is anything else. */
export function infeasibleDetailsOf(error: unknown): InfeasibleDetails | null {
  if (!isApiError(error) || error.code !== 'infeasible' || !isObject(error.details)) return null;
  const d = error.details;
  if (!isObject(d.bestReachable) || !Array.isArray(d.binding) || !Array.isArray(d.suggestions)) return null;
  return {
    bestReachable: d.bestReachable as unknown as Nutrients,
    binding: d.binding as TargetName[],
    suggestions: d.suggestions as Suggestion[],
    before: d.before as RewritePlan,
    closest: d.closest as RewritePlan,
    held: Array.isArray(d.held) ? (d.held as HeldLine[]) : [],
    skippedLines: Array.isArray(d.skippedLines) ? (d.skippedLines as SkippedLine[]) : [],
    solver: isObject(d.solver) ? (d.solver as unknown as SolverInfo) : undefined,
  };
}
