/**
 * The analysis on the Kitchen page, for whatever the page puts below it (the rewrite panel).
 *
 * `CurrentAnalysis` is always a consistent triple: `analysis` is the server's answer to exactly
 * `lines` and `servings`, so `lines[i]` is the request line behind `analysis.lines[i]`
 * (pins included: `foodId` and `grams` the cook chose, which a rewrite should treat as the recipe).
 * While the cook edits, the triple stays on the last answer and `updating` turns true until the
 * next answer arrives; it is null until the first analysis succeeds or when every line is removed.
 *
 * Features do not import each other, so the rewrite feature should not import this file: the
 * Kitchen page reads `useCurrentAnalysis()` (or the value it provides) and hands it to the panel
 * as props. The type is made of `shared/schemas/analyze` types only, so the panel can declare
 * the same shape itself:
 *
 *   { lines: LineInput[]; servings: number; analysis: AnalyzeResponse; updating: boolean }
 */
import { createContext, useContext } from 'react';
import type { AnalyzeResponse, LineInput } from '../../../shared/schemas/analyze';
import type { LineFunction } from '../../../shared/culinary/types';

export interface CurrentAnalysis {
  /** the request lines the analysis answered, in order */
  lines: LineInput[];
  servings: number;
  analysis: AnalyzeResponse;
  /** the cook has changed something and a newer analysis is on its way */
  updating: boolean;
  /** what the cook says lines do, by index into `lines`, over Hearthswap's reading */
  lineRoles: Partial<Record<number, LineFunction>>;
}

export const CurrentAnalysisContext = createContext<CurrentAnalysis | null>(null);

/** The Kitchen page's current analysis, or null when there is none (or outside the page). */
export function useCurrentAnalysis(): CurrentAnalysis | null {
  return useContext(CurrentAnalysisContext);
}
