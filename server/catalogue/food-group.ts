import table from './sr28-food-groups.json';

const prefixes = table.prefixes as Record<string, string>;
const exceptions = table.exceptions as Record<string, string>;

/** Two-digit SR28 food group code of an NDB number (the NDB prefix is not always the group). */
export function sr28FoodGroup(ndb: string): string {
  return exceptions[ndb] ?? prefixes[ndb.slice(0, 2)] ?? ndb.slice(0, 2);
}
