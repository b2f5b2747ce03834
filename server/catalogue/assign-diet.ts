import type { CatalogueFood, DietFlag } from '../../shared/food';
import dietJson from '../../data/diet-rules.json';
import { compileTerms, headText, nameText, type NameText } from './name-terms';

export type DietInput = Pick<CatalogueFood, 'name' | 'foodGroup'>;

const veg = dietJson.vegetarian;
const vegan = dietJson.vegan;
const df = dietJson.dairyFree;
const gf = dietJson.glutenFree;

const vegetarianRule = {
  notGroups: new Set(veg.notGroups),
  needCueGroups: new Set(veg.needCueGroups),
  cues: compileTerms(veg.cues),
  animal: compileTerms(veg.animal),
  harmless: compileTerms(veg.harmless),
};
const veganRule = {
  groups: new Set(vegan.groups),
  cues: compileTerms(vegan.cues),
  animal: compileTerms(vegan.animalProducts),
  harmless: compileTerms(vegan.harmless),
};
const dairyFreeRule = {
  uncertain: new Set(df.uncertainGroups),
  dairyGroup: df.dairyGroup,
  eggHeads: compileTerms(df.eggHeads),
  dairy: compileTerms(df.dairy),
  harmless: compileTerms(df.harmless),
};
const glutenFreeRule = {
  groups: new Set(gf.groups),
  heads: new Map(Object.entries(gf.headsInOtherGroups as Record<string, string[]>).map(([g, h]) => [g, compileTerms(h)])),
  cues: compileTerms(gf.cues),
  gluten: compileTerms(gf.gluten),
  strong: compileTerms(gf.strongGluten),
  harmless: compileTerms(gf.harmless),
};

function isVegetarian(text: NameText, group: string): boolean {
  if (vegetarianRule.notGroups.has(group)) return false;
  const cue = vegetarianRule.cues.test(text);
  // "Bacon, meatless", "Worthington meatless chicken roll": the cue outweighs the meat word it qualifies
  if (cue) return true;
  if (vegetarianRule.needCueGroups.has(group)) return false;
  return !vegetarianRule.animal.test(vegetarianRule.harmless.remove(text));
}

function isVegan(text: NameText, group: string, vegetarian: boolean): boolean {
  if (!vegetarian) return false;
  const cleaned = veganRule.harmless.remove(text);
  if (veganRule.animal.test(cleaned)) return false;
  return veganRule.groups.has(group) || veganRule.cues.test(text);
}

function isDairyFree(text: NameText, head: NameText, group: string): boolean {
  if (dairyFreeRule.uncertain.has(group)) return false;
  if (group === dairyFreeRule.dairyGroup && !dairyFreeRule.eggHeads.test(head)) return false;
  return !dairyFreeRule.dairy.test(dairyFreeRule.harmless.remove(text));
}

function isGlutenFree(text: NameText, head: NameText, group: string): boolean {
  const cleaned = glutenFreeRule.harmless.remove(text);
  if (glutenFreeRule.cues.test(text)) return !glutenFreeRule.strong.test(cleaned);
  const inGroup = glutenFreeRule.groups.has(group) || (glutenFreeRule.heads.get(group)?.test(head) ?? false);
  if (!inGroup) return false;
  return !glutenFreeRule.gluten.test(cleaned);
}

/**
 * Diet flags plain from the food group and name. Conservative: a custom food with no group gets a flag
 * only from an explicit cue such as "gluten-free" or "vegan".
 */
export function assignDiet(food: DietInput): DietFlag[] {
  const text = nameText(food.name);
  const head = headText(food.name);
  const group = food.foodGroup;
  const flags: DietFlag[] = [];
  if (group === '') {
    if (veganRule.cues.test(text)) flags.push('vegetarian', 'vegan', 'dairy-free');
    else if (vegetarianRule.cues.test(text) && !vegetarianRule.animal.test(vegetarianRule.harmless.remove(text))) flags.push('vegetarian');
    if (glutenFreeRule.cues.test(text) && !glutenFreeRule.strong.test(glutenFreeRule.harmless.remove(text))) flags.push('gluten-free');
    return flags;
  }
  const vegetarian = isVegetarian(text, group);
  if (vegetarian) flags.push('vegetarian');
  if (isVegan(text, group, vegetarian)) flags.push('vegan');
  if (isDairyFree(text, head, group) || flags.includes('vegan')) flags.push('dairy-free');
  if (isGlutenFree(text, head, group)) flags.push('gluten-free');
  return flags;
}
