import { useQuery } from '@tanstack/react-query';
import { myFoodsQuery } from '../../../lib/api/foods';

/** GET /api/foods/mine: the foods you entered from labels, then your coach's. */
export function useMyFoods() {
  return useQuery({ ...myFoodsQuery(), select: (body) => body.foods });
}
