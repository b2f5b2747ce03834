/** The Kitchen page's recipe and analysis in sessionStorage, so a reload of the tab keeps them. */
import type { AnalyzeResponse, LineInput } from '../../../shared/schemas/analyze';
import type { KitchenLine } from './kitchen-lines';
import { LINE_FUNCTIONS, type LineFunction } from '../../../shared/culinary/types';

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

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const isServings = (v: unknown): v is number => typeof v === 'number' && Number.isInteger(v) && v >= 1 && v <= 100;
const optionalNumber = (v: unknown, min: number) => v === undefined || (typeof v === 'number' && Number.isFinite(v) && v >= min);

function isLineInput(v: unknown): v is LineInput {
  return isObject(v) && typeof v.input === 'string' && optionalNumber(v.foodId, 1) && optionalNumber(v.grams, 0);
}

function isKitchenLine(v: unknown): v is KitchenLine {
  const role = (v as Record<string, unknown>)?.role;
  return isLineInput(v) && typeof (v as Record<string, unknown>).key === 'string' && (role === undefined || LINE_FUNCTIONS.includes(role as LineFunction));
}

// The analysis came from our own server; checking its outline is enough to catch a stale or foreign entry.
function isAnalysis(v: unknown): v is AnalyzeResponse {
  return isObject(v) && Array.isArray(v.lines) && isObject(v.totals) && isObject(v.perServing) && typeof v.totalGrams === 'number';
}

function isAnswered(v: unknown, analysis: AnalyzeResponse): v is AnsweredRequest {
  return (
    isObject(v) &&
    Array.isArray(v.keys) &&
    v.keys.every((k) => typeof k === 'string') &&
    v.keys.length === analysis.lines.length &&
    Array.isArray(v.lines) &&
    v.lines.every(isLineInput) &&
    isServings(v.servings)
  );
}

function isSource(v: unknown): v is KitchenSource {
  return (
    isObject(v) &&
    typeof v.recipeId === 'number' &&
    v.recipeId >= 1 &&
    typeof v.title === 'string' &&
    typeof v.versionNumber === 'number' &&
    v.versionNumber >= 1 &&
    typeof v.latestNumber === 'number' &&
    typeof v.openedLines === 'string'
  );
}

/** A snapshot read back from storage, or null when there is none or it is not one of ours. */
export function parseKitchen(raw: string | null): KitchenSnapshot | null {
  if (!raw) return null;
  let data: unknown;
  try {
    data = JSON.parse(raw);
  } catch {
    return null;
  }
  if (!isObject(data) || data.v !== VERSION) return null;
  if (!Array.isArray(data.lines) || !data.lines.every(isKitchenLine) || !isServings(data.servings)) return null;
  const analysis = isAnalysis(data.analysis) ? data.analysis : null;
  const answered = analysis && isAnswered(data.answered, analysis) ? data.answered : null;
  return {
    pastedText: typeof data.pastedText === 'string' ? data.pastedText : '',
    source: isSource(data.source) ? data.source : null,
    lines: data.lines,
    servings: data.servings,
    analysis: answered ? analysis : null,
    answered,
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
