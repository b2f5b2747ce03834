import type { Swap } from '../../shared/schemas/swaps';
import { formatNumber } from './format';

/** Role codes in words ("melting-cheese" → "Melting cheese"); the page passes the foods feature's own. */
export type RoleLabel = (role: string) => string;

/** What a swap replaces: the food's name, or every food in a role. */
export function swapFromWords(swap: Pick<Swap, 'fromFood' | 'fromRole'>, roleLabel: RoleLabel): string {
  if (swap.fromFood) return swap.fromFood.name;
  if (swap.fromRole) return `Any ${roleLabel(swap.fromRole).toLowerCase()}`;
  return 'A food no longer in the catalogue';
}

export function swapToWords(swap: Pick<Swap, 'toFood'>): string {
  return swap.toFood?.name ?? 'A food no longer in the catalogue';
}

/**
 * The volume ratio in a cook's words: how much of the new food per cup of the old.
 * 1 keeps the volume; 1.25 is "a quarter more by volume".
 */
export function volumeRatioWords(ratio: number): string {
  if (!Number.isFinite(ratio) || ratio <= 0) return 'Same volume';
  if (Math.abs(ratio - 1) < 0.005) return 'Same volume';
  const percent = Math.round(Math.abs(ratio - 1) * 100);
  return ratio > 1 ? `${percent}% more by volume` : `${percent}% less by volume`;
}

/** "1 : 1.25" — mL of the new food for each mL of the old. */
export function volumeRatioFigure(ratio: number): string {
  return `1 : ${formatNumber(ratio, 2)}`;
}

/** Tags as the coach types them, comma-separated: trimmed, no blanks, no repeats (case-insensitive). */
export function parseTags(text: string): string[] {
  const seen = new Set<string>();
  const tags: string[] = [];
  for (const raw of text.split(',')) {
    const tag = raw.trim().replace(/\s+/g, ' ');
    const key = tag.toLowerCase();
    if (!tag || seen.has(key)) continue;
    seen.add(key);
    tags.push(tag);
  }
  return tags;
}
