import { useQuery } from '@tanstack/react-query';
import { prepQuery } from '../../../lib/api/prep';

/** A saved version scaled to `portions`; refreshed with its recipe (the key sits under the recipe's). */
export function usePrep(id: number | null, number: number | null, portions: number | null) {
  return useQuery(prepQuery(id, number, portions));
}
