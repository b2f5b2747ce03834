import type { Swap, SwapStatus } from '../../../shared/schemas/swaps';

export interface SwapFilters {
  status: SwapStatus | 'all';
  /** a culinary role the swap starts from, or 'all' */
  role: string;
  text: string;
}

export const NO_SWAP_FILTERS: SwapFilters = { status: 'all', role: 'all', text: '' };

export function hasSwapFilters(filters: SwapFilters): boolean {
  return filters.status !== 'all' || filters.role !== 'all' || filters.text.trim() !== '';
}

/** Lowercase, without accents, so "Creme" finds "crème". */
function fold(text: string): string {
  return text
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase();
}

/**
 * The swaps that pass every filter. The text filter matches each word anywhere in the foods'
 * names, the role (as written and in words), the note and the tags.
 */
export function filterSwaps(swaps: readonly Swap[], filters: SwapFilters, roleLabel: (role: string) => string): Swap[] {
  const words = fold(filters.text).split(/\s+/).filter(Boolean);
  return swaps.filter((swap) => {
    if (filters.status !== 'all' && swap.status !== filters.status) return false;
    if (filters.role !== 'all' && swap.fromRole !== filters.role) return false;
    if (words.length === 0) return true;
    const haystack = fold(
      [swap.fromFood?.name, swap.fromRole, swap.fromRole ? roleLabel(swap.fromRole) : '', swap.toFood?.name, swap.note, ...swap.tags]
        .filter(Boolean)
        .join(' \u0000 '),
    );
    return words.every((word) => haystack.includes(word));
  });
}

/** The roles swaps in the library start from, for the role filter, in ROLES order where known. */
export function rolesInUse(swaps: readonly Swap[], order: readonly string[]): string[] {
  const used = new Set(swaps.map((s) => s.fromRole).filter((r): r is string => Boolean(r)));
  const known = order.filter((r) => used.has(r));
  const unknown = [...used].filter((r) => !order.includes(r)).sort();
  return [...known, ...unknown];
}
