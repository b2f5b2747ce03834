/** The Kitchen page's recipe and analysis in sessionStorage, so a reload of the tab keeps them. */
import type { AnalyzeResponse, LineInput } from '../../../shared/schemas/analyze';
import type { KitchenLine } from './kitchen-lines';
import { z } from 'zod';
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

const servingsSchema = z.number().int().min(1).max(100);
// Lines keep whatever else they carry (the line's key, its role); only what a request needs is checked.
const lineInputSchema = z.looseObject({ input: z.string(), foodId: z.number().min(1).optional(), grams: z.number().min(0).optional() });
const kitchenLineSchema = lineInputSchema.extend({ key: z.string(), role: z.enum(LINE_FUNCTIONS).optional() });
// The analysis came from our own server; checking its outline is enough to catch a stale or foreign entry.
const analysisSchema = z.looseObject({ lines: z.array(z.unknown()), totals: z.looseObject({}), perServing: z.looseObject({}), totalGrams: z.number() });
const answeredSchema = z.looseObject({ keys: z.array(z.string()), lines: z.array(lineInputSchema), servings: servingsSchema });
const sourceSchema = z.looseObject({
  recipeId: z.number().min(1),
  title: z.string(),
  versionNumber: z.number().min(1),
  latestNumber: z.number(),
  openedLines: z.string(),
});
const snapshotSchema = z.looseObject({ v: z.literal(VERSION), lines: z.array(kitchenLineSchema), servings: servingsSchema });

/** A snapshot read back from storage, or null when there is none or it is not one of ours. */
export function parseKitchen(raw: string | null): KitchenSnapshot | null {
  if (!raw) return null;
  let data: unknown;
  try {
    data = JSON.parse(raw);
  } catch {
    return null;
  }
  const snapshot = snapshotSchema.safeParse(data);
  if (!snapshot.success) return null;
  const { lines, servings, analysis: storedAnalysis, answered: storedAnswered, source, pastedText } = snapshot.data;
  const analysis = analysisSchema.safeParse(storedAnalysis);
  const answered = answeredSchema.safeParse(storedAnswered);
  const matches = analysis.success && answered.success && answered.data.keys.length === analysis.data.lines.length;
  const parsedSource = sourceSchema.safeParse(source);
  return {
    pastedText: typeof pastedText === 'string' ? pastedText : '',
    source: parsedSource.success ? (parsedSource.data as KitchenSource) : null,
    lines: lines as KitchenLine[],
    servings,
    analysis: matches ? (analysis.data as unknown as AnalyzeResponse) : null,
    answered: matches ? (answered.data as AnsweredRequest) : null,
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
