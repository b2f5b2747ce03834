import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { AnalyzedLine, AnalyzeRequest, AnalyzeResponse, FoodSummary, LineInput } from '../../../shared/schemas/analyze';
import { useAnalyzeRecipe } from './api/analyze-recipe';
import type { CurrentAnalysis } from './current-analysis';
import type { LineFunction } from '../../../shared/culinary/types';
import {
  lineInputs,
  lineRolesFor,
  linesFromAnalysis,
  newLineKey,
  requestSignature,
  withFood,
  withGrams,
  withoutLine,
  withRole,
  type KitchenLine,
} from './kitchen-lines';
import { emptyKitchen, loadKitchen, saveKitchen, type KitchenSnapshot, type KitchenSource } from './kitchen-storage';

const storage = (): Storage | undefined => (typeof window === 'undefined' ? undefined : window.sessionStorage);

export interface Kitchen {
  lines: KitchenLine[];
  servings: number;
  pastedText: string;
  /** the saved version these lines came from, or null */
  source: KitchenSource | null;
  analysis: AnalyzeResponse | null;
  /** the answer for one line, by its key; null while a new line waits for its first answer */
  analysedLine: (key: string) => AnalyzedLine | null;
  /** the last answer with the request it answers, for the panel below the analysis */
  current: CurrentAnalysis | null;
  /** a request is on its way */
  analysing: boolean;
  /** the request on its way is pasted text (the form shows it busy) */
  analysingText: boolean;
  /** how many pasted recipes have been answered on this page: the results take focus when it grows */
  pastesAnswered: number;
  /** what the last paste held besides ingredient lines (title, servings, headings, method), until the next paste */
  textReading: NonNullable<AnalyzeResponse['fromText']> | null;
  /** the analysis on screen no longer answers the lines (a request is on its way or failed) */
  stale: boolean;
  error: unknown;
  analyseText: (text: string, servings: number) => void;
  setServings: (servings: number) => void;
  chooseFood: (key: string, food: FoodSummary | null) => void;
  setGrams: (key: string, grams: number | null) => void;
  /** what the line does in the dish, or null for Hearthswap's reading; no new analysis is needed */
  setRole: (key: string, role: LineFunction | null) => void;
  addLine: (line: LineInput) => void;
  removeLine: (key: string) => void;
  /** puts a line removed a moment ago back where it was */
  undoRemove: () => void;
  /** the line removed last, while it can still be put back */
  removed: { input: string } | null;
  /** a saved version's lines (with their foods and grams pinned) replace the Kitchen's */
  openVersion: (lines: LineInput[], servings: number, source: KitchenSource) => void;
  /** the lines were saved as a new version of the source recipe */
  setSource: (source: KitchenSource | null) => void;
  retry: () => void;
  clear: () => void;
}

/**
 * The Kitchen page's recipe and its analysis: every edit re-asks the server with the cook's pins
 * (the newest request wins, older ones are aborted) and the whole state survives a reload in sessionStorage.
 */
export function useKitchen(): Kitchen {
  const [snapshot, setSnapshot] = useState<KitchenSnapshot>(() => loadKitchen(storage()) ?? emptyKitchen());
  const snapshotRef = useRef(snapshot);
  const mutation = useAnalyzeRecipe();
  const { mutate, reset } = mutation;
  const inFlight = useRef<AbortController | null>(null);
  const lastRequest = useRef<{ request: AnalyzeRequest; onAnswer: (response: AnalyzeResponse) => void } | null>(null);
  const [pastesAnswered, setPastesAnswered] = useState(0);
  const [textReading, setTextReading] = useState<NonNullable<AnalyzeResponse['fromText']> | null>(null);
  const [removed, setRemoved] = useState<{ line: KitchenLine; index: number } | null>(null);

  const update = useCallback((change: (s: KitchenSnapshot) => KitchenSnapshot) => {
    const next = change(snapshotRef.current);
    snapshotRef.current = next;
    setSnapshot(next);
    return next;
  }, []);

  useEffect(() => saveKitchen(storage(), snapshot), [snapshot]);

  const send = useCallback(
    (request: AnalyzeRequest, onAnswer: (response: AnalyzeResponse) => void) => {
      inFlight.current?.abort();
      const controller = new AbortController();
      inFlight.current = controller;
      lastRequest.current = { request, onAnswer };
      mutate(
        { request, signal: controller.signal },
        {
          onSuccess: (response) => {
            if (!controller.signal.aborted) onAnswer(response);
          },
        },
      );
    },
    [mutate],
  );

  /** Ask again for the lines and servings now on the page. */
  const analyseLines = useCallback(
    (s: KitchenSnapshot) => {
      if (s.lines.length === 0) {
        inFlight.current?.abort();
        reset();
        update((prev) => ({ ...prev, analysis: null, answered: null }));
        return;
      }
      const lines = lineInputs(s.lines);
      const keys = s.lines.map((l) => l.key);
      const servings = s.servings;
      send({ lines, servings }, (analysis) => update((prev) => ({ ...prev, analysis, answered: { keys, lines, servings } })));
    },
    [reset, send, update],
  );

  // A reload in the middle of an edit: ask for what is on the page.
  useEffect(() => {
    const s = snapshotRef.current;
    const answered = s.answered ? requestSignature(s.answered.lines, s.answered.servings) : null;
    if (s.lines.length > 0 && answered !== requestSignature(lineInputs(s.lines), s.servings)) analyseLines(s);
    return () => inFlight.current?.abort();
  }, [analyseLines]);

  const analyseText = useCallback(
    (text: string, servings: number) => {
      update((prev) => ({ ...prev, pastedText: text, source: null }));
      send({ text, servings }, (analysis) => {
        const lines = linesFromAnalysis(analysis.lines);
        update((prev) => ({
          ...prev,
          lines,
          servings,
          analysis,
          answered: { keys: lines.map((l) => l.key), lines: lineInputs(lines), servings },
        }));
        setPastesAnswered((n) => n + 1);
        setTextReading(analysis.fromText ?? null);
      });
    },
    [send, update],
  );

  const editAndAsk = useCallback((change: (s: KitchenSnapshot) => KitchenSnapshot) => analyseLines(update(change)), [analyseLines, update]);

  const { analysis, answered, lines, servings } = snapshot;
  const analysedByKey = useMemo(() => {
    const map = new Map<string, AnalyzedLine>();
    if (analysis && answered) answered.keys.forEach((key, i) => analysis.lines[i] && map.set(key, analysis.lines[i]));
    return map;
  }, [analysis, answered]);

  const stale = useMemo(
    () => Boolean(answered) && requestSignature(answered!.lines, answered!.servings) !== requestSignature(lineInputs(lines), servings),
    [answered, lines, servings],
  );

  const current = useMemo<CurrentAnalysis | null>(
    () =>
      analysis && answered && lines.length > 0
        ? { lines: answered.lines, servings: answered.servings, analysis, updating: stale, lineRoles: lineRolesFor(lines, answered.keys) }
        : null,
    [analysis, answered, lines, stale],
  );

  const analysing = mutation.isPending;
  return {
    lines,
    servings,
    pastedText: snapshot.pastedText,
    source: snapshot.source,
    analysis,
    analysedLine: (key) => analysedByKey.get(key) ?? null,
    current,
    analysing,
    analysingText: analysing && mutation.variables !== undefined && 'text' in mutation.variables.request && mutation.variables.request.text !== undefined,
    pastesAnswered,
    textReading,
    stale: stale || (analysing && Boolean(analysis)),
    error: mutation.isError ? mutation.error : null,
    analyseText,
    setServings: (n) => editAndAsk((s) => ({ ...s, servings: n })),
    chooseFood: (key, food) => editAndAsk((s) => ({ ...s, lines: withFood(s.lines, key, food ? food.id : null) })),
    setGrams: (key, grams) => editAndAsk((s) => ({ ...s, lines: withGrams(s.lines, key, grams) })),
    setRole: (key, role) => update((s) => ({ ...s, lines: withRole(s.lines, key, role) })),
    addLine: (line) => editAndAsk((s) => ({ ...s, lines: [...s.lines, { ...line, key: newLineKey() }] })),
    removeLine: (key) => {
      const index = snapshotRef.current.lines.findIndex((l) => l.key === key);
      if (index >= 0) setRemoved({ line: snapshotRef.current.lines[index], index });
      editAndAsk((s) => ({ ...s, lines: withoutLine(s.lines, key) }));
    },
    removed: removed ? { input: removed.line.input } : null,
    undoRemove: () => {
      if (!removed) return;
      setRemoved(null);
      editAndAsk((s) => {
        if (s.lines.some((l) => l.key === removed.line.key)) return s;
        const lines = [...s.lines];
        lines.splice(Math.min(removed.index, lines.length), 0, removed.line);
        return { ...s, lines };
      });
    },
    openVersion: (lines, servings, source) => {
      setRemoved(null);
      setTextReading(null);
      editAndAsk(() => ({
        ...emptyKitchen(),
        pastedText: lines.map((l) => l.input).join('\n'),
        source,
        servings,
        lines: lines.map((l) => ({ ...l, key: newLineKey() })),
      }));
    },
    setSource: (source) => update((s) => ({ ...s, source })),
    retry: () => {
      const last = lastRequest.current;
      if (last) send(last.request, last.onAnswer);
    },
    clear: () => {
      inFlight.current?.abort();
      reset();
      setRemoved(null);
      setTextReading(null);
      update(() => emptyKitchen());
    },
  };
}
