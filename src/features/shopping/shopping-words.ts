import type { VersionKind, VersionSummary } from '../../../shared/schemas/recipes';
import { countOf } from '../../lib/words';

const KIND_WORDS: Record<VersionKind, string> = { original: 'as written', rewrite: 'rewrite', edit: 'edit' };

/** "Version 3 · edit — Spinach folded into the sauce" */
export function versionOption(version: Pick<VersionSummary, 'number' | 'kind' | 'note'>): string {
  const note = version.note.trim();
  const short = note.length > 60 ? `${note.slice(0, 57)}…` : note;
  return `Version ${version.number} · ${KIND_WORDS[version.kind]}${short ? ` — ${short}` : ''}`;
}

export function portionsWord(portions: number): string {
  return countOf(portions, 'portion');
}

/** A whole number from 1 to 100 for a batch, or the reason it is not one. */
export function portionsProblem(portions: number): string | undefined {
  if (!Number.isInteger(portions)) return 'Portions must be a whole number from 1 to 100.';
  if (portions < 1) return 'Portions must be at least 1.';
  if (portions > 100) return 'Portions is at most 100.';
  return undefined;
}
