import pluralize from 'pluralize';
import { formatNumber } from './format';

/** "1 recipe", "3 recipes", "2 batches", "1,250 foods": a count with its noun in the right number. */
export function countOf(count: number, noun: string): string {
  return `${formatNumber(count, 0)} ${pluralize(noun, count)}`;
}

/** The noun alone in the right number for `count`: "cup" / "cups", "leaf" / "leaves". */
export function nounFor(count: number, noun: string): string {
  return pluralize(noun, count);
}
