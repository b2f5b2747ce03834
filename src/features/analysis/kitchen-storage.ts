/** The Kitchen page's recipe and analysis in sessionStorage, so a reload of the tab keeps them. */
import type { AnalyzeResponse, LineInput } from '../../../shared/schemas/analyze';
import type { KitchenLine } from './kitchen-lines';
import { LINE_FUNCTIONS } from '../../../shared/culinary/types';

export const KITCHEN_STORAGE_KEY = 'hearthswap:kitchen';
const VERSION = 1;

/** What an analysis answered: the keys of its lines in order and the request it was for. */
export interface AnsweredRequest {
  keys: string[];
  lines: LineInput[];
  servings: number;
}

/** The saved version the Kitchen's lines came from: saving then adds a version to that recipe. */
export interface KitchenSource {
  recipeId: number;
  title: string;
  /** the version opened (or saved last from here) */
  versionNumber: number;
  /** the recipe's newest version number when it was opened: the next save is one after */
  latestNumber: number;
  /** the lines as opened, to tell whether the cook changed them */
  openedLines: string;
}

export interface KitchenSnapshot {
  /** the text last pasted, to show in the form again */
  pastedText: string;
  /** null for a recipe pasted or built here */
  source: KitchenSource | null;
  lines: KitchenLine[];
  servings: number;
  analysis: AnalyzeResponse | null;
  answered: AnsweredRequest | null;
}

export const DEFAULT_SERVINGS = 4;

export function emptyKitchen(): KitchenSnapshot {
  return { pastedText: '', source: null, lines: [], servings: DEFAULT_SERVINGS, analysis: null, answered: null };
}

// Plain checks rather than zod: this module is part of the Kitchen's first visit, and zod is not.
type Loose = Record<string, unknown>;
const isObject = (x: unknown): x is Loose => typeof x === 'object' && x !== null && !Array.isArray(x);
const isNumber = (x: unknown, min = -Infinity): x is number => typeof x === 'number' && Number.isFinite(x) && x >= min;
const optional = (x: unknown, check: (x: unknown) => boolean) => x === undefined || check(x);
const isServings = (x: unknown): x is number => Number.isInteger(x) && (x as number) >= 1 && (x as number) <= 100;
const ROLES: readonly unknown[] = LINE_FUNCTIONS;

// Lines keep whatever else they carry (the line's key, its role); only what a request needs is checked.
const isLineInput = (x: unknown): x is Loose =>
  isObject(x) && typeof x.input === 'string' && optional(x.foodId, (v) => isNumber(v, 1)) && optional(x.grams, (v) => isNumber(v, 0));
const isKitchenLine = (x: unknown) => isLineInput(x) && typeof x.key === 'string' && optional(x.role, (v) => ROLES.includes(v));
const isArrayOf = (x: unknown, check: (item: unknown) => boolean): x is unknown[] => Array.isArray(x) && x.every(check);
// The analysis came from our own server; checking its outline is enough to catch a stale or foreign entry.
const isAnalysis = (x: unknown): x is Loose & { lines: unknown[] } =>
  isObject(x) && Array.isArray(x.lines) && isObject(x.totals) && isObject(x.perServing) && isNumber(x.totalGrams);
const isAnswered = (x: unknown): x is Loose & { keys: string[] } =>
  isObject(x) && isArrayOf(x.keys, (k) => typeof k === 'string') && isArrayOf(x.lines, isLineInput) && isServings(x.servings);
const isSource = (x: unknown) =>
  isObject(x) &&
  isNumber(x.recipeId, 1) &&
  typeof x.title === 'string' &&
  isNumber(x.versionNumber, 1) &&
  isNumber(x.latestNumber) &&
  typeof x.openedLines === 'string';

/** A snapshot read back from storage, or null when there is none or it is not one of ours. */
export function parseKitchen(raw: string | null): KitchenSnapshot | null {
  if (!raw) return null;
  let data: unknown;
  try {
    data = JSON.parse(raw);
  } catch {
    return null;
  }
  if (!isObject(data) || data.v !== VERSION || !isArrayOf(data.lines, isKitchenLine) || !isServings(data.servings)) return null;
  const { lines, servings, analysis, answered, source, pastedText } = data;
  const matches = isAnalysis(analysis) && isAnswered(answered) && answered.keys.length === analysis.lines.length;
  return {
    pastedText: typeof pastedText === 'string' ? pastedText : '',
    source: isSource(source) ? (source as unknown as KitchenSource) : null,
    lines: lines as KitchenLine[],
    servings,
    analysis: matches ? (analysis as unknown as AnalyzeResponse) : null,
    answered: matches ? (answered as unknown as AnsweredRequest) : null,
  };
}

export function serializeKitchen(snapshot: KitchenSnapshot): string {
  return JSON.stringify({ v: VERSION, ...snapshot });
}

/** Storage can be missing (private windows) or full; the page works without it. */
export function loadKitchen(storage: Pick<Storage, 'getItem'> | undefined): KitchenSnapshot | null {
  try {
    return parseKitchen(storage?.getItem(KITCHEN_STORAGE_KEY) ?? null);
  } catch {
    return null;
  }
}

export function saveKitchen(storage: Pick<Storage, 'setItem' | 'removeItem'> | undefined, snapshot: KitchenSnapshot): void {
  try {
    if (snapshot.lines.length === 0 && !snapshot.pastedText) storage?.removeItem(KITCHEN_STORAGE_KEY);
    else storage?.setItem(KITCHEN_STORAGE_KEY, serializeKitchen(snapshot));
  } catch {
    // Quota exceeded or storage switched off: the page keeps its state in memory.
  }
}
