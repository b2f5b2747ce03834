import type { ReactNode } from 'react';
import type { PickedFood } from './swap-draft';

/**
 * The catalogue search box comes from the page (the foods feature owns it); this feature only
 * says where it goes and what to do with the choice.
 */
export interface FoodSearchSlotProps {
  label: string;
  hint?: string;
  onChoose: (food: PickedFood) => void;
  /** Escape in an empty box: go back to the food chosen before */
  onCancel?: () => void;
  autoFocus?: boolean;
}

export type RenderFoodSearch = (props: FoodSearchSlotProps) => ReactNode;
