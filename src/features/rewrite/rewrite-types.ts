/**
 * POST /api/rewrite as the client reads it: the response types live in shared/schemas/rewrite.ts, so a
 * server change breaks the client's typecheck; here only the reading of a 422 `infeasible`.
 */
import type { Nutrients } from '../../../shared/nutrition';
import type { HeldLine, SolverInfo, Suggestion, TargetName } from '../../../shared/rewrite/types';
import type { InfeasibleDetails, RewritePlan, SkippedLine } from '../../../shared/schemas/rewrite';
import { isApiError } from '../../lib/api-client';

export type {
  InfeasibleDetails,
  RewriteChange,
  RewritePlan,
  RewritePlanLine,
  RewriteResponse as RewriteAnswer,
  SkippedLine,
} from '../../../shared/schemas/rewrite';

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
