/** Food matching and weighing: PRODUCT.md "The computation", steps 2 and 3. */
export { createFoodMatcher, MATCH_CONFIDENCE_FLOOR, choicesIn } from './food-matcher';
export type { FoodMatch, FoodMatcher, FoodSearchHit, MatchOptions, MatchVia } from './food-matcher';
export { DEFAULT_ALIASES, aliasKey } from './alias-index';
export type { AliasTable } from './alias-index';
export { portionsFor, countDefaultFor, loadCuratedPortions, indexCuratedPortions } from './portions';
export type { CuratedPortions, CuratedPortionFile, CuratedPortionRow } from './portions';
export { weighLine, WARNING_SET_AMOUNT, WARNING_NO_FOOD } from './weigh-line';
export type { WeighedLine, WeighOptions } from './weigh-line';
