/**
 * The hand-labelled ingredient lines of tests/reference/labelled-lines/ and how a line is scored:
 * its food is acceptable when it is one of the labelled SR28 foods (or, when SR28 has no fitting
 * food, when the line comes back unmatched or flagged "check this match"), and its grams are
 * within 15 % of the labelled weight (lines labelled without a weight are scored on food only).
 */
import { readReferenceFile } from './reference-data';

export interface HandLabelledLine {
  row: number;
  half: 'tune' | 'held-out';
  input: string;
  /** acceptable SR28 NDB numbers; empty when SR28 has no fitting food */
  foods: string[];
  foodPattern?: string;
  grams: number | null;
  weightSource: string;
}

/** What the scorer reads of an analysed line. */
export interface ScoredAnswer {
  food: { source: string; sourceId: string; name: string } | null;
  grams: number;
  checkMatch: boolean;
}

/** The labelled batches, each split into its own tuning and held-out halves and scored apart. */
export const HAND_LABELLED_BATCHES = [
  { name: 'batch 1 (rows 1-340)', file: 'labelled-lines/tastecooking-labelled.json' },
  { name: 'batch 2 (rows 341-540)', file: 'labelled-lines/tastecooking-labelled-2.json' },
  { name: 'batch 3 (rows 541-700)', file: 'labelled-lines/tastecooking-labelled-3.json' },
  { name: 'batch 4 (rows 701-900)', file: 'labelled-lines/tastecooking-labelled-4.json' },
] as const;
export const HAND_LABELLED_FILE = HAND_LABELLED_BATCHES[0].file;
export const GRAMS_TOLERANCE = 0.15;

export function readHandLabelledLines(file: string = HAND_LABELLED_FILE): HandLabelledLine[] {
  return (JSON.parse(readReferenceFile(file).toString('utf8')) as { lines: HandLabelledLine[] }).lines;
}

export function foodAcceptable(label: HandLabelledLine, answer: ScoredAnswer): boolean {
  if (label.foods.length === 0) return answer.food === null || answer.checkMatch;
  return answer.food !== null && answer.food.source === 'usda-sr28' && label.foods.includes(answer.food.sourceId);
}

export function gramsAcceptable(label: HandLabelledLine, answer: ScoredAnswer): boolean {
  if (label.grams === null || label.foods.length === 0) return true;
  return Math.abs(answer.grams - label.grams) <= GRAMS_TOLERANCE * label.grams;
}

/**
 * Why a line failed, one kind per line: no food where SR28 has one, a wrong food, 0 g where a
 * weight was labelled, a confident food where SR28 has none fitting, or grams more than 15 % off (food right or wrong).
 */
export type FailureKind = 'no food' | 'food wrong' | 'matched, SR28 has none' | '0 g' | 'grams off';
export const FAILURE_KINDS: readonly FailureKind[] = ['no food', 'food wrong', 'matched, SR28 has none', '0 g', 'grams off'];

export interface HalfScore {
  lines: number;
  food: number;
  grams: number;
  both: number;
  failures: { label: HandLabelledLine; answer: ScoredAnswer; food: boolean; grams: boolean; kind: FailureKind }[];
  /** failing lines per kind */
  kinds: Record<FailureKind, number>;
}

export function failureKind(label: HandLabelledLine, answer: ScoredAnswer, food: boolean): FailureKind {
  if (!food) return answer.food === null ? 'no food' : label.foods.length === 0 ? 'matched, SR28 has none' : 'food wrong';
  return answer.grams <= 0 ? '0 g' : 'grams off';
}

export function scoreHalf(labels: HandLabelledLine[], answer: (input: string) => ScoredAnswer): HalfScore {
  const score: HalfScore = {
    lines: labels.length,
    food: 0,
    grams: 0,
    both: 0,
    failures: [],
    kinds: { 'no food': 0, 'food wrong': 0, 'matched, SR28 has none': 0, '0 g': 0, 'grams off': 0 },
  };
  for (const label of labels) {
    const a = answer(label.input);
    const food = foodAcceptable(label, a);
    const grams = gramsAcceptable(label, a);
    if (food) score.food++;
    if (grams) score.grams++;
    if (food && grams) score.both++;
    else {
      const kind = failureKind(label, a, food);
      score.kinds[kind]++;
      score.failures.push({ label, answer: a, food, grams, kind });
    }
  }
  return score;
}

export const share = (n: number, of: number) => (of === 0 ? 0 : n / of);
