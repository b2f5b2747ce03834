/**
 * Labels for the private development set (comfort-dev-recipes.ts): for each dish, one label per line, with the
 * meaning of the panel's (tests/panel/comfort-recipes.ts): `keep` says why the line usually stays as written, `swaps`
 * are the substitutes a good home cook making the dish lighter accepts (a pattern over the USDA SR28 long
 * description, grams of substitute per gram replaced, the largest share of the line), `scale` the band of the
 * written grams the unswapped food may take. The panel's label rules (tests/panel/README.md) apply alike: more of a
 * mixed dish's lean main protein (`moreOfLean`, `MORE_LEAN`), never for a sausage, a cured meat or where the protein
 * is the portion.
 *
 * Written from general cooking knowledge (*common practice*) before any plan of these dishes was printed; they bound
 * what the rules may do to the development set, as the panel's labels do to the panel. Never edit a label to fit a plan.
 */
import {
  LESS,
  MORE,
  MORE_LEAN,
  NOT_COOKED,
  chickenBreastCooked,
  eggWhites,
  evaporatedSkim,
  groundTurkey,
  halfAsApplesauce,
  halfAsYogurt,
  halfOfBakedCheeseSauceMilk,
  halfOfBatterMilk,
  halfWholeWheatFlour,
  keepAromatic,
  keepLeavener,
  keepLiquid,
  keepSeasoning,
  leanGroundBeef,
  leanHam,
  leanPorkSausage,
  leanerMince,
  betterPasta,
  lighterCream,
  lighterCreamCheese,
  lighterMilk,
  lighterSourCream,
  lowFatCottage,
  moreOfLean,
  partSkimMozzarella,
  partSkimRicotta,
  plainYogurt,
  reducedFatCheddar,
  swap,
  wholeWheatTortilla,
  type PanelLine,
  type PanelSwap,
} from '../panel/comfort-recipes';
import { COMFORT_DEV_SET, type DevRecipe } from './comfort-dev-recipes';

// Substitutes the panel's constants do not name, by class (*common practice* unless said otherwise).
/** riced cauliflower for up to half of a cooked rice or a mash's potatoes, by weight */
const halfCauliflower = swap('^Cauliflower, (raw|frozen, unprepared|cooked, boiled)', [0.8, 1.25], 0.5);
/** skinless breast for thigh meat, by weight (the panel's chickenBreastRaw names only SR28's breast "with added solution") */
const chickenBreastRaw = swap('^Chicken, broilers? or fryers, breast, skinless, boneless, meat only, (with added solution, )?raw', [0.8, 1.25]);
const brownRice = swap('^Rice, brown, (long|medium)-grain, cooked', [0.85, 1.15]);
/** trimmed lean cuts of the same animal for a stew's or braise's fatty cut (SR28 "lean only" entries) */
const leanBeefCut = swap('^Beef, (chuck|round)\\b.*lean only.*raw$');
const leanPorkCut = swap('^Pork, fresh, (shoulder|loin)\\b.*lean only.*raw$');
/** lean lamb leg, minced at home or by the butcher; or half the lamb as lean beef or turkey mince */
const leanLambMince = [
  swap('^Lamb, domestic, (leg|cubed for stew)\\b.*lean only.*raw$'),
  { ...leanGroundBeef, maxShare: 0.5 },
  { ...groundTurkey, maxShare: 0.5 },
];
const italianTurkeySausage = swap(`${NOT_COOKED}(Turkey sausage, fresh|Sausage, chicken or turkey, Italian style|Sausage Italian turkey)`);
const breakfastTurkeySausage = swap(`${NOT_COOKED}(Turkey sausage, fresh|Sausage turkey breakfast)`);
const smokedTurkeySausage = swap(`${NOT_COOKED}(Sausage .*turkey.* smoked|Sausage turkey hot smoked|Turkey, pork, and beef sausage, low fat, smoked)`);
const turkeySalami = swap('^Salami, cooked, turkey', [0.85, 1.15]);
/** raw bacon slice for slice: a Canadian-bacon slice or a turkey-bacon slice weighs about half to all of a raw strip */
const canadianBacon = swap('^Canadian bacon, unprepared', [0.4, 1]);
const turkeyBacon = swap('^(Turkey bacon, unprepared|Bacon, turkey, low sodium)', [0.45, 1.1]);
const lightMayo = swap('^Salad dressing, (mayonnaise, light|mayonnaise-type, light)$', [0.8, 1.25]);
const lowFatAmerican = swap('^(Cheese, pasteurized process, American, low fat|Cheese product, pasteurized process, American, reduced fat)', [0.85, 1.15]);
/** bread, buns and muffins piece for piece: whole-grain or reduced-calorie of the same size */
const lighterBuns = swap('^Rolls, hamburger or hot ?dog, (whole wheat|reduced-calorie|mixed-grain|wheat)', [0.8, 1.15]);
const lighterSlicedBread = swap('^Bread, (whole-wheat, commercial|reduced-calorie, (white|wheat|oatmeal)|wheat$)', [0.7, 1.15]);
const wholeWheatEnglishMuffin = swap('^English muffins, (whole-wheat|wheat)$', [0.85, 1.15]);
const lighterSyrup = swap('^Syrups, table blends, pancake, reduced-calorie', [0.8, 1.25]);
/** a baked cheesecake keeps its body with light cream cheese (not fat-free, which turns grainy) and takes a third as Greek yogurt */
const cheesecakeCreamCheese = [swap('^Cheese, (neufchatel|cream, low fat)', [0.9, 1.1]), swap('^Yogurt, Greek, plain, (nonfat|lowfat)', [0.85, 1.15], 1 / 3)];

/** sugar that is the bake's sweetness, not its structure: up to 30 % less, as the panel's quick breads */
const LESS_SWEET: [number, number] = [0.7, 1];
/** oil for shallow frying: oven-fried with a brushing of oil instead */
const OVEN_FRIED = LESS(0.25);
/** oil or butter for sautéing or browning: the panel's tacos and griddle */
const SAUTE_FAT = LESS(0.3);
const keepExtract = 'extract: kept as written';
const keepSauce = 'the sauce';
const vegetable = (text: string): PanelLine => ({ text, keep: 'vegetable', scale: MORE });
const seasoning = (text: string): PanelLine => ({ text, keep: keepSeasoning });
const aromatic = (text: string): PanelLine => ({ text, keep: keepAromatic });
const leavener = (text: string): PanelLine => ({ text, keep: keepLeavener });
const liquid = (text: string): PanelLine => ({ text, keep: keepLiquid });
const swaps = (text: string, accepted: PanelSwap[], scale?: [number, number]): PanelLine => ({ text, swaps: accepted, ...(scale ? { scale } : {}) });

export const COMFORT_DEV_LABELS: Record<string, PanelLine[]> = {
  'sloppy-joes': [
    swaps('1 1/2 lb ground beef', moreOfLean(leanerMince), MORE_LEAN),
    aromatic('1 onion, chopped'),
    vegetable('1 green bell pepper, chopped'),
    aromatic('2 cloves garlic, minced'),
    { text: '3/4 cup ketchup', keep: keepSauce },
    { text: '1 (8 oz) can tomato sauce', keep: keepSauce },
    { text: '2 tablespoons brown sugar', keep: 'sweetens the sauce', scale: LESS() },
    seasoning('1 tablespoon Worcestershire sauce'),
    seasoning('1 tablespoon yellow mustard'),
    seasoning('1/2 teaspoon salt'),
    seasoning('1/4 teaspoon black pepper'),
    { text: '6 hamburger buns', keep: 'the bun', swaps: [lighterBuns] },
  ],
  'stuffed-shells': [
    swaps('12 oz jumbo pasta shells', betterPasta),
    swaps('15 oz whole milk ricotta cheese', [partSkimRicotta, lowFatCottage]),
    { text: '10 oz frozen chopped spinach, thawed and squeezed dry', keep: 'vegetable', scale: MORE },
    swaps('2 cups shredded mozzarella cheese', [partSkimMozzarella], LESS(0.6)),
    { text: '1/2 cup grated Parmesan cheese', keep: 'flavour', scale: LESS(0.6) },
    { text: '1 large egg', keep: 'binds the filling', swaps: eggWhites() },
    aromatic('2 cloves garlic, minced'),
    seasoning('1/2 teaspoon salt'),
    seasoning('1/4 teaspoon black pepper'),
    { text: '1 (24 oz) jar marinara sauce', keep: keepSauce },
  ],
  'cheeseburger-skillet-macaroni': [
    swaps('1 lb ground beef', moreOfLean(leanerMince), MORE_LEAN),
    aromatic('1 onion, chopped'),
    aromatic('2 cloves garlic, minced'),
    swaps('8 oz elbow macaroni', betterPasta),
    liquid('2 cups beef broth'),
    swaps('1 cup whole milk', [lighterMilk, evaporatedSkim]),
    { text: '1 (8 oz) can tomato sauce', keep: keepSauce },
    seasoning('1 teaspoon paprika'),
    seasoning('1/2 teaspoon salt'),
    seasoning('1/4 teaspoon black pepper'),
    swaps('1 1/2 cups shredded cheddar cheese', [reducedFatCheddar], LESS(0.6)),
  ],
  'chicken-lo-mein': [
    { text: '8 oz lo mein egg noodles', keep: 'the noodles', swaps: betterPasta },
    // thigh meat without skin is already lean (about 4 g fat per 100 g raw): the label rule's ×1–1.5 as it is
    swaps('1 lb boneless skinless chicken thighs, thinly sliced', moreOfLean([chickenBreastRaw]), MORE_LEAN),
    { text: '3 tablespoons vegetable oil', keep: 'stir-fry fat', scale: SAUTE_FAT },
    { text: '2 large eggs, beaten', keep: 'scrambled into the noodles', swaps: eggWhites() },
    vegetable('2 cups shredded cabbage'),
    vegetable('1 carrot, cut into matchsticks'),
    aromatic('4 green onions, sliced'),
    aromatic('2 cloves garlic, minced'),
    seasoning('1/4 cup soy sauce'),
    seasoning('1 tablespoon oyster sauce'),
    seasoning('1 teaspoon sugar'),
    seasoning('1 teaspoon sesame oil'),
  ],
  'sesame-chicken': [
    // coated, fried pieces served on rice: the chicken is the portion, so no more of it
    swaps('1 1/2 lb boneless skinless chicken thighs, cut into pieces', [chickenBreastRaw]),
    { text: '1 large egg', keep: 'holds the coating', swaps: eggWhites() },
    { text: '1/2 cup cornstarch', keep: 'the coating', scale: LESS() },
    { text: '1/3 cup vegetable oil', keep: 'frying fat', scale: OVEN_FRIED },
    aromatic('3 cloves garlic, minced'),
    seasoning('1/4 cup soy sauce'),
    { text: '1/4 cup honey', keep: 'the glaze', scale: [0.67, 1] },
    seasoning('2 tablespoons rice vinegar'),
    seasoning('1 tablespoon sesame oil'),
    { text: '1 tablespoon sesame seeds', keep: 'garnish' },
    { text: '4 cups cooked white rice', keep: 'served with it', swaps: [halfCauliflower, brownRice] },
  ],
  'pork-schnitzel': [
    { text: '1 1/2 lb boneless pork loin chops, pounded thin', keep: 'the portion (already a lean cut)' },
    { text: '1/2 cup all-purpose flour', keep: 'the breading' },
    { text: '2 large eggs', keep: 'the breading', swaps: eggWhites() },
    { text: '1 1/2 cups dry bread crumbs', keep: 'the breading' },
    { text: '1/2 cup vegetable oil, for frying', keep: 'frying fat', scale: OVEN_FRIED },
    seasoning('1 teaspoon salt'),
    seasoning('1/2 teaspoon black pepper'),
    { text: '1 lemon, cut into wedges', keep: 'served with it' },
  ],
  'creamy-parmesan-chicken': [
    { text: '1 1/2 lb boneless skinless chicken breasts', keep: 'the portion (already lean)' },
    { text: '2 tablespoons olive oil', keep: 'sautéing fat', scale: SAUTE_FAT },
    { text: '2 tablespoons butter', keep: 'sauce fat', scale: LESS() },
    aromatic('4 cloves garlic, minced'),
    liquid('1 cup chicken broth'),
    // the sauce simmers: half-and-half or evaporated skim milk, never yogurt (it splits)
    swaps('1 cup heavy cream', lighterCream),
    { text: '1/2 cup grated Parmesan cheese', keep: keepSauce, scale: LESS(0.6) },
    { text: '1/2 cup sun-dried tomatoes, chopped', keep: 'flavour' },
    vegetable('2 cups fresh spinach'),
    seasoning('1 teaspoon Italian seasoning'),
    seasoning('1/2 teaspoon salt'),
    seasoning('1/4 teaspoon black pepper'),
  ],
  'chicken-divan': [
    swaps('3 cups shredded cooked chicken', moreOfLean([chickenBreastCooked]), MORE_LEAN),
    vegetable('4 cups broccoli florets, steamed'),
    { text: '1 (10.5 oz) can condensed cream of chicken soup', keep: 'the sauce: one can stays one can' },
    swaps('1/2 cup mayonnaise', [lightMayo, plainYogurt]),
    swaps('1/2 cup sour cream', [plainYogurt, lighterSourCream]),
    seasoning('1 teaspoon lemon juice'),
    swaps('1 cup shredded cheddar cheese', [reducedFatCheddar], LESS()),
    { text: '1/2 cup dry bread crumbs, for the top', keep: 'topping crunch', scale: LESS() },
    { text: '2 tablespoons butter, melted', keep: 'crisps the crumbs', scale: LESS() },
  ],
  'ham-salami-calzones': [
    { text: '3 cups all-purpose flour', keep: 'the dough', swaps: [halfWholeWheatFlour] },
    leavener('2 1/4 teaspoons instant yeast'),
    { text: '1 teaspoon sugar', keep: 'feeds the yeast' },
    seasoning('1 teaspoon salt'),
    liquid('1 cup warm water'),
    { text: '2 tablespoons olive oil', keep: 'the dough' },
    swaps('8 oz sliced deli ham', [leanHam]),
    { text: '4 oz sliced salami', keep: 'the flavour of the filling', scale: LESS(), swaps: [turkeySalami] },
    swaps('1 cup whole milk ricotta cheese', [partSkimRicotta, lowFatCottage]),
    swaps('1 1/2 cups shredded mozzarella cheese', [partSkimMozzarella], LESS(0.6)),
    { text: '1/4 cup grated Parmesan cheese', keep: 'flavour', scale: LESS(0.6) },
    { text: '1 large egg, beaten, for brushing', keep: 'the wash', swaps: eggWhites() },
  ],
  'stuffed-peppers': [
    { text: '6 green bell peppers, tops cut off and seeded', keep: 'the vessel' },
    swaps('1 lb ground beef', moreOfLean(leanerMince), MORE_LEAN),
    aromatic('1 onion, chopped'),
    aromatic('2 cloves garlic, minced'),
    { text: '1 cup cooked white rice', keep: 'the filling', swaps: [halfCauliflower, brownRice] },
    { text: '1 (15 oz) can tomato sauce', keep: keepSauce },
    { text: '1 (14.5 oz) can diced tomatoes', keep: keepSauce },
    seasoning('1 teaspoon Italian seasoning'),
    seasoning('1 teaspoon salt'),
    seasoning('1/2 teaspoon black pepper'),
    swaps('1 cup shredded mozzarella cheese', [partSkimMozzarella], LESS()),
  ],
  'korean-beef-bowls': [
    swaps('1 lb ground beef', moreOfLean(leanerMince), MORE_LEAN),
    aromatic('3 cloves garlic, minced'),
    aromatic('1 tablespoon grated fresh ginger'),
    seasoning('1/4 cup soy sauce'),
    { text: '3 tablespoons brown sugar', keep: 'sweetens the sauce', scale: LESS() },
    seasoning('1 teaspoon sesame oil'),
    seasoning('1/4 teaspoon red pepper flakes'),
    aromatic('3 green onions, sliced'),
    { text: '4 cups cooked white rice', keep: 'the bowl', swaps: [halfCauliflower, brownRice] },
  ],
  'pork-paprikash': [
    swaps('2 lb pork shoulder, cut into cubes', moreOfLean([leanPorkCut])),
    { text: '2 tablespoons vegetable oil', keep: 'browning fat', scale: SAUTE_FAT },
    { text: '2 onions, chopped', keep: 'the base of the sauce' },
    seasoning('2 tablespoons sweet paprika'),
    { text: '2 tablespoons all-purpose flour', keep: 'thickens the sauce' },
    liquid('1 1/2 cups chicken broth'),
    // stirred in off the heat at the end, so Greek yogurt holds
    swaps('1 cup sour cream', [plainYogurt, lighterSourCream]),
    seasoning('1/2 teaspoon salt'),
    swaps('12 oz egg noodles', betterPasta),
  ],
  jambalaya: [
    swaps('1 lb boneless skinless chicken thighs, cubed', moreOfLean([chickenBreastRaw]), MORE_LEAN),
    { text: '12 oz smoked sausage, sliced', keep: 'the flavour of the dish', scale: LESS(), swaps: [smokedTurkeySausage] },
    { text: '2 tablespoons vegetable oil', keep: 'browning fat', scale: SAUTE_FAT },
    aromatic('1 onion, chopped'),
    vegetable('1 green bell pepper, chopped'),
    vegetable('2 stalks celery, chopped'),
    aromatic('3 cloves garlic, minced'),
    { text: '1 1/2 cups long-grain white rice', keep: 'cooks in the broth' },
    { text: '1 (14.5 oz) can diced tomatoes', keep: keepSauce },
    liquid('3 cups chicken broth'),
    seasoning('2 teaspoons Cajun seasoning'),
    seasoning('1/2 teaspoon salt'),
  ],
  'beef-and-broccoli': [
    // flank is already lean (about 6 g fat per 100 g raw): the label rule's ×1–1.5 as it is, in a dish served on rice
    { text: '1 lb flank steak, thinly sliced', keep: 'already a lean cut', scale: MORE_LEAN },
    { text: '2 tablespoons cornstarch', keep: 'coats the beef and thickens the sauce' },
    { text: '3 tablespoons vegetable oil', keep: 'stir-fry fat', scale: SAUTE_FAT },
    vegetable('4 cups broccoli florets'),
    aromatic('3 cloves garlic, minced'),
    aromatic('1 tablespoon grated fresh ginger'),
    seasoning('1/3 cup soy sauce'),
    { text: '3 tablespoons brown sugar', keep: 'sweetens the sauce', scale: LESS() },
    liquid('1/2 cup beef broth'),
    seasoning('1 teaspoon sesame oil'),
    { text: '4 cups cooked white rice', keep: 'served with it', swaps: [halfCauliflower, brownRice] },
  ],
  'chicken-alfredo-bake': [
    swaps('12 oz penne pasta', betterPasta),
    swaps('3 cups shredded cooked chicken', moreOfLean([chickenBreastCooked]), MORE_LEAN),
    { text: '4 tablespoons butter', keep: 'roux: needs real fat', scale: LESS(0.6) },
    aromatic('2 cloves garlic, minced'),
    { text: '3 tablespoons all-purpose flour', keep: 'roux: thickens the sauce' },
    swaps('2 cups whole milk', [lighterMilk, evaporatedSkim, ...halfOfBakedCheeseSauceMilk]),
    swaps('1 cup heavy cream', lighterCream),
    { text: '1 cup grated Parmesan cheese', keep: keepSauce, scale: LESS(0.6) },
    swaps('1 1/2 cups shredded mozzarella cheese', [partSkimMozzarella], LESS(0.6)),
    seasoning('1/2 teaspoon salt'),
    seasoning('1/4 teaspoon black pepper'),
  ],
  'cheesy-potato-soup': [
    { text: '6 slices bacon, chopped', keep: 'the flavour of the soup', scale: LESS(), swaps: [canadianBacon, turkeyBacon] },
    aromatic('1 onion, chopped'),
    { text: '3 tablespoons butter', keep: 'roux: needs real fat', scale: LESS(0.6) },
    { text: '1/4 cup all-purpose flour', keep: 'roux: thickens the soup' },
    liquid('4 cups chicken broth'),
    { text: '2 lb russet potatoes, peeled and diced', keep: 'the soup', swaps: [halfCauliflower] },
    swaps('1 1/2 cups whole milk', [lighterMilk, evaporatedSkim]),
    swaps('1/2 cup heavy cream', lighterCream),
    swaps('2 cups shredded sharp cheddar cheese', [reducedFatCheddar], LESS(0.6)),
    // stirred in off the heat before serving
    swaps('1/2 cup sour cream', [plainYogurt, lighterSourCream]),
    seasoning('1 teaspoon salt'),
    seasoning('1/2 teaspoon black pepper'),
    { text: '2 green onions, sliced, for the top', keep: 'garnish' },
  ],
  'baked-ziti': [
    swaps('1 lb ziti', betterPasta),
    { text: '1 lb Italian sausage, casings removed', keep: 'the flavour of the dish', scale: LESS(), swaps: [italianTurkeySausage] },
    aromatic('1 onion, chopped'),
    aromatic('3 cloves garlic, minced'),
    { text: '1 (24 oz) jar marinara sauce', keep: keepSauce },
    swaps('15 oz whole milk ricotta cheese', [partSkimRicotta, lowFatCottage]),
    { text: '1 large egg', keep: 'binds the ricotta', swaps: eggWhites() },
    swaps('2 cups shredded mozzarella cheese', [partSkimMozzarella], LESS(0.6)),
    { text: '1/2 cup grated Parmesan cheese', keep: 'flavour', scale: LESS(0.6) },
    seasoning('1 teaspoon dried basil'),
    seasoning('1/2 teaspoon salt'),
  ],
  'french-toast': [
    { text: '8 slices white bread', keep: 'the toast', swaps: [lighterSlicedBread] },
    { text: '4 large eggs', keep: 'the custard', swaps: eggWhites() },
    swaps('1 cup whole milk', [lighterMilk]),
    { text: '2 tablespoons sugar', keep: 'browning', scale: LESS(0.25) },
    { text: '1 teaspoon vanilla extract', keep: keepExtract },
    seasoning('1/2 teaspoon ground cinnamon'),
    seasoning('1 pinch salt'),
    { text: '2 tablespoons butter, for the pan', keep: 'griddle fat', scale: SAUTE_FAT },
    { text: '1/2 cup maple syrup, for serving', keep: 'poured at the table', scale: LESS(), swaps: [lighterSyrup] },
  ],
  'blueberry-muffins': [
    { text: '2 cups all-purpose flour', keep: 'structure', swaps: [halfWholeWheatFlour] },
    { text: '3/4 cup sugar', keep: 'sweetness and tenderness', scale: LESS_SWEET },
    leavener('2 teaspoons baking powder'),
    seasoning('1/2 teaspoon salt'),
    { text: '1/2 cup butter, melted', keep: 'tenderness', swaps: [halfAsApplesauce, halfAsYogurt] },
    { text: '2 large eggs', keep: 'structure', swaps: eggWhites() },
    // yogurt muffins are everyday home baking: the batter-milk label rule, as for pancakes
    swaps('1/2 cup whole milk', [lighterMilk, ...halfOfBatterMilk]),
    { text: '1 teaspoon vanilla extract', keep: keepExtract },
    { text: '1 1/2 cups fresh blueberries', keep: 'the fruit', scale: [1, 1.3] },
  ],
  cornbread: [
    { text: '1 cup yellow cornmeal', keep: 'the bread' },
    { text: '1 cup all-purpose flour', keep: 'structure', swaps: [halfWholeWheatFlour] },
    { text: '1/4 cup sugar', keep: 'sweetness (optional in much cornbread)', scale: LESS() },
    leavener('1 tablespoon baking powder'),
    leavener('1/2 teaspoon baking soda'),
    seasoning('1/2 teaspoon salt'),
    { text: '1 cup buttermilk', keep: 'the acid for the soda', swaps: halfOfBatterMilk },
    { text: '1/3 cup butter, melted', keep: 'tenderness', swaps: [halfAsApplesauce, halfAsYogurt] },
    { text: '2 large eggs', keep: 'structure', swaps: eggWhites() },
  ],
  'chicken-noodle-casserole': [
    swaps('8 oz egg noodles', betterPasta),
    swaps('3 cups shredded cooked chicken', moreOfLean([chickenBreastCooked]), MORE_LEAN),
    { text: '1 (10.5 oz) can condensed cream of chicken soup', keep: 'the sauce: one can stays one can' },
    swaps('1 cup sour cream', [plainYogurt, lighterSourCream]),
    swaps('1/2 cup whole milk', [lighterMilk]),
    vegetable('1 cup frozen peas'),
    swaps('1 1/2 cups shredded cheddar cheese', [reducedFatCheddar], LESS(0.6)),
    { text: '1/2 cup dry bread crumbs, for the top', keep: 'topping crunch', scale: LESS() },
    { text: '2 tablespoons butter, melted', keep: 'crisps the crumbs', scale: LESS() },
    seasoning('1/2 teaspoon salt'),
    seasoning('1/4 teaspoon black pepper'),
  ],
  'meatballs-marinara': [
    // the meatballs are the portion (as a meatloaf): leaner mince, not more of it
    swaps('1 lb ground beef', leanerMince),
    swaps('1/2 lb ground pork', leanerMince),
    { text: '1/2 cup dry bread crumbs', keep: 'binder' },
    { text: '1/3 cup grated Parmesan cheese', keep: 'flavour' },
    { text: '1 large egg', keep: 'binder', swaps: eggWhites() },
    swaps('1/4 cup whole milk', [lighterMilk]),
    aromatic('2 cloves garlic, minced'),
    seasoning('1 teaspoon salt'),
    seasoning('1/2 teaspoon black pepper'),
    { text: '2 tablespoons olive oil', keep: 'browning fat (or bake the meatballs)', scale: SAUTE_FAT },
    { text: '1 (24 oz) jar marinara sauce', keep: keepSauce },
  ],
  'breakfast-burritos': [
    { text: '1 lb pork breakfast sausage', keep: 'the flavour of the filling', scale: LESS(), swaps: [breakfastTurkeySausage, leanPorkSausage] },
    { text: '8 large eggs', keep: 'the filling', swaps: eggWhites() },
    swaps('1/4 cup whole milk', [lighterMilk]),
    { text: '2 cups frozen diced hash brown potatoes', keep: 'the filling' },
    { text: '1 tablespoon butter', keep: 'pan fat', scale: SAUTE_FAT },
    swaps('1 1/2 cups shredded cheddar cheese', [reducedFatCheddar], LESS()),
    // a rolled burrito stays a flour-type tortilla (corn tortillas crack when rolled)
    { text: '6 large flour tortillas', keep: 'the wrap', swaps: [wholeWheatTortilla] },
    { text: '1/2 cup salsa', keep: 'sauce', scale: MORE },
    seasoning('1/2 teaspoon salt'),
    seasoning('1/4 teaspoon black pepper'),
  ],
  'cheese-grits': [
    liquid('4 cups water'),
    swaps('1 cup whole milk', [lighterMilk]),
    { text: '1 cup quick-cooking grits', keep: 'the dish' },
    seasoning('1 teaspoon salt'),
    // the cheese carries the richness: a tablespoon of butter for the pot is how lighter cheese grits are made
    { text: '4 tablespoons butter', keep: 'stirred in for richness', scale: LESS(0.25) },
    swaps('1 1/2 cups shredded sharp cheddar cheese', [reducedFatCheddar], LESS(0.6)),
    seasoning('1/4 teaspoon black pepper'),
  ],
  'beef-stew': [
    swaps('2 lb beef chuck, cut into cubes', moreOfLean([leanBeefCut])),
    { text: '1/4 cup all-purpose flour', keep: 'dredges the beef and thickens the stew' },
    { text: '3 tablespoons vegetable oil', keep: 'browning fat', scale: SAUTE_FAT },
    aromatic('1 onion, chopped'),
    aromatic('3 cloves garlic, minced'),
    seasoning('2 tablespoons tomato paste'),
    liquid('4 cups beef broth'),
    vegetable('4 carrots, sliced'),
    { text: '1 1/2 lb potatoes, cubed', keep: 'the stew' },
    vegetable('2 stalks celery, sliced'),
    seasoning('1 teaspoon dried thyme'),
    seasoning('1 teaspoon salt'),
    seasoning('1/2 teaspoon black pepper'),
  ],
  'lamb-shepherds-pie': [
    swaps('1 1/2 lb ground lamb', moreOfLean(leanLambMince)),
    aromatic('1 onion, chopped'),
    vegetable('2 carrots, diced'),
    { text: '2 tablespoons all-purpose flour', keep: 'thickens the filling' },
    seasoning('1 tablespoon tomato paste'),
    liquid('1 cup beef broth'),
    seasoning('1 tablespoon Worcestershire sauce'),
    vegetable('1 cup frozen peas'),
    { text: '2 lb russet potatoes, peeled', keep: 'the mashed top', swaps: [halfCauliflower] },
    { text: '4 tablespoons butter', keep: 'stirred into the mash', scale: LESS() },
    swaps('1/2 cup whole milk', [lighterMilk]),
    seasoning('1 teaspoon salt'),
    seasoning('1/2 teaspoon black pepper'),
  ],
  'sausage-peppers-pasta': [
    swaps('12 oz penne pasta', betterPasta),
    { text: '1 lb Italian sausage links, sliced', keep: 'the flavour of the dish', scale: LESS(), swaps: [italianTurkeySausage] },
    { text: '2 tablespoons olive oil', keep: 'sautéing fat', scale: SAUTE_FAT },
    vegetable('2 bell peppers, sliced'),
    vegetable('1 onion, sliced'),
    aromatic('3 cloves garlic, minced'),
    { text: '1 (14.5 oz) can diced tomatoes', keep: keepSauce },
    // simmered into the sauce: half-and-half or evaporated skim milk, never yogurt
    swaps('1/2 cup heavy cream', lighterCream),
    { text: '1/2 cup grated Parmesan cheese', keep: 'flavour', scale: LESS(0.6) },
    seasoning('1/2 teaspoon salt'),
    seasoning('1/4 teaspoon red pepper flakes'),
  ],
  blondies: [
    { text: '1/2 cup butter, melted', keep: 'brown butter is the flavour and the chew' },
    { text: '1 cup packed brown sugar', keep: 'structure and chew (a bar, like a brownie)' },
    { text: '1 large egg', keep: 'structure' },
    { text: '1 teaspoon vanilla extract', keep: keepExtract },
    { text: '1 cup all-purpose flour', keep: 'structure', swaps: [halfWholeWheatFlour] },
    leavener('1/2 teaspoon baking powder'),
    seasoning('1/4 teaspoon salt'),
    { text: '1/2 cup semisweet chocolate chips', keep: 'the point of the bar', scale: LESS() },
  ],
  'streusel-coffee-cake': [
    { text: '1 1/2 cups all-purpose flour', keep: 'structure', swaps: [halfWholeWheatFlour] },
    { text: '3/4 cup sugar', keep: 'sweetness and tenderness', scale: LESS_SWEET },
    leavener('2 teaspoons baking powder'),
    seasoning('1/4 teaspoon salt'),
    { text: '1/2 cup butter, softened', keep: 'tenderness', swaps: [halfAsApplesauce, halfAsYogurt] },
    { text: '1 large egg', keep: 'structure', swaps: eggWhites() },
    swaps('1/2 cup sour cream', [plainYogurt, lighterSourCream]),
    swaps('1/2 cup whole milk', [lighterMilk]),
    { text: '1 teaspoon vanilla extract', keep: keepExtract },
    { text: '1/2 cup packed brown sugar, for the topping', keep: 'the streusel', scale: [0.67, 1] },
    { text: '1/3 cup all-purpose flour, for the topping', keep: 'the streusel', swaps: [halfWholeWheatFlour] },
    seasoning('1 teaspoon ground cinnamon'),
    { text: '3 tablespoons cold butter, for the topping', keep: 'binds the streusel', scale: [0.67, 1] },
  ],
  'buttermilk-biscuits': [
    { text: '2 cups all-purpose flour', keep: 'the dough', swaps: [halfWholeWheatFlour] },
    leavener('1 tablespoon baking powder'),
    leavener('1/2 teaspoon baking soda'),
    seasoning('1 teaspoon salt'),
    { text: '1 tablespoon sugar', keep: 'browning', scale: LESS() },
    { text: '6 tablespoons cold butter', keep: 'the flaky layers', scale: [0.67, 1] },
    { text: '3/4 cup buttermilk', keep: 'the acid for the soda (already low in fat)' },
  ],
  'apple-crisp': [
    { text: '6 apples, peeled and sliced', keep: 'the fruit', scale: [1, 1.3] },
    { text: '1/4 cup sugar', keep: 'sweetens the fruit', scale: LESS() },
    seasoning('1 tablespoon lemon juice'),
    seasoning('1 teaspoon ground cinnamon'),
    { text: '3/4 cup old-fashioned rolled oats', keep: 'the topping' },
    { text: '1/2 cup all-purpose flour', keep: 'the topping', swaps: [halfWholeWheatFlour] },
    { text: '1/2 cup packed brown sugar', keep: 'the topping', scale: [0.67, 1] },
    { text: '1/2 cup cold butter, cubed', keep: 'binds the topping', scale: LESS(0.6) },
    seasoning('1/4 teaspoon salt'),
  ],
  'vanilla-cheesecake': [
    { text: '1 1/2 cups graham cracker crumbs', keep: 'the crust' },
    { text: '1/3 cup butter, melted', keep: 'binds the crust', scale: LESS(0.7) },
    { text: '1/4 cup sugar', keep: 'the crust', scale: LESS() },
    { text: '3 (8 oz) packages cream cheese, softened', keep: 'the filling', swaps: cheesecakeCreamCheese },
    { text: '1 cup sugar', keep: 'sweetness and texture of the filling', scale: [0.75, 1] },
    swaps('1 cup sour cream', [plainYogurt, lighterSourCream]),
    { text: '3 large eggs', keep: 'sets the filling (yolks for a creamy set)', swaps: eggWhites(0.5) },
    { text: '1 teaspoon vanilla extract', keep: keepExtract },
  ],
  'crisp-waffles': [
    { text: '2 cups all-purpose flour', keep: 'structure of the batter', swaps: [halfWholeWheatFlour] },
    { text: '2 tablespoons sugar', keep: 'browning', scale: LESS(0.25) },
    leavener('1 tablespoon baking powder'),
    seasoning('1/2 teaspoon salt'),
    { text: '2 large eggs', keep: 'structure', swaps: eggWhites() },
    swaps('1 3/4 cups whole milk', [lighterMilk, ...halfOfBatterMilk]),
    { text: '1/2 cup butter, melted', keep: 'crispness', scale: LESS(), swaps: [halfAsApplesauce, halfAsYogurt] },
    { text: '1 teaspoon vanilla extract', keep: keepExtract },
  ],
  'spinach-frittata': [
    // eggs are the dish: whites for up to half of them (a lighter frittata), not an egg-white omelette
    { text: '8 large eggs', keep: 'the dish', swaps: eggWhites(0.5) },
    swaps('1/2 cup whole milk', [lighterMilk]),
    { text: '1 tablespoon olive oil', keep: 'pan fat', scale: SAUTE_FAT },
    aromatic('1 small onion, chopped'),
    vegetable('3 cups fresh spinach'),
    swaps('1 cup shredded cheddar cheese', [reducedFatCheddar], LESS()),
    seasoning('1/2 teaspoon salt'),
    seasoning('1/4 teaspoon black pepper'),
  ],
  'baked-oatmeal': [
    { text: '2 cups old-fashioned rolled oats', keep: 'the dish' },
    { text: '1/3 cup packed brown sugar', keep: 'sweetness', scale: LESS() },
    leavener('1 teaspoon baking powder'),
    seasoning('1 teaspoon ground cinnamon'),
    seasoning('1/2 teaspoon salt'),
    swaps('1 3/4 cups whole milk', [lighterMilk]),
    { text: '1 large egg', keep: 'sets the oats', swaps: eggWhites() },
    { text: '3 tablespoons butter, melted', keep: 'richness', scale: LESS(), swaps: [halfAsApplesauce, halfAsYogurt] },
    { text: '1 teaspoon vanilla extract', keep: keepExtract },
    { text: '1 cup fresh blueberries', keep: 'the fruit', scale: MORE },
  ],
  'breakfast-sandwiches': [
    { text: '4 English muffins, split and toasted', keep: 'the bread', swaps: [wholeWheatEnglishMuffin] },
    { text: '8 slices bacon', keep: 'the flavour of the sandwich', scale: LESS(), swaps: [canadianBacon, turkeyBacon] },
    { text: '4 large eggs', keep: 'the filling', swaps: eggWhites() },
    { text: '1 tablespoon butter', keep: 'pan fat', scale: SAUTE_FAT },
    { text: '4 slices American cheese', keep: 'a slice a sandwich', swaps: [lowFatAmerican] },
    seasoning('1/4 teaspoon salt'),
    seasoning('1/4 teaspoon black pepper'),
  ],
  'scalloped-potatoes': [
    { text: '3 lb russet potatoes, thinly sliced', keep: 'the dish' },
    aromatic('1 onion, thinly sliced'),
    { text: '4 tablespoons butter', keep: 'roux: needs real fat', scale: LESS(0.6) },
    { text: '1/4 cup all-purpose flour', keep: 'roux: thickens the sauce' },
    // a long bake that bubbles: lighter milk or evaporated skim, not yogurt or cottage cheese
    swaps('2 1/2 cups whole milk', [lighterMilk, evaporatedSkim]),
    swaps('1 1/2 cups shredded cheddar cheese', [reducedFatCheddar], LESS(0.6)),
    seasoning('1 teaspoon salt'),
    seasoning('1/2 teaspoon black pepper'),
  ],
  'broccoli-rice-casserole': [
    { text: '3 cups cooked white rice', keep: 'the casserole', swaps: [halfCauliflower, brownRice] },
    vegetable('1 (16 oz) bag frozen chopped broccoli'),
    aromatic('1 onion, chopped'),
    { text: '2 tablespoons butter', keep: 'sautéing fat', scale: LESS() },
    { text: '1 (10.5 oz) can condensed cream of mushroom soup', keep: 'the sauce: one can stays one can' },
    swaps('1/2 cup whole milk', [lighterMilk]),
    swaps('1 1/2 cups shredded cheddar cheese', [reducedFatCheddar], LESS(0.6)),
    seasoning('1/2 teaspoon salt'),
    seasoning('1/4 teaspoon black pepper'),
  ],
  'creamed-spinach': [
    { text: '2 (10 oz) packages frozen chopped spinach, thawed and squeezed dry', keep: 'the dish', scale: MORE },
    { text: '2 tablespoons butter', keep: 'sautéing fat', scale: LESS() },
    aromatic('1 shallot, minced'),
    aromatic('2 cloves garlic, minced'),
    swaps('4 oz cream cheese', [lighterCreamCheese]),
    swaps('1/2 cup heavy cream', lighterCream),
    { text: '1/2 cup grated Parmesan cheese', keep: keepSauce, scale: LESS(0.6) },
    seasoning('1/4 teaspoon ground nutmeg'),
    seasoning('1/2 teaspoon salt'),
  ],
};

export interface LabelledDevRecipe extends DevRecipe {
  labels: PanelLine[];
}

/**
 * The development dishes that have labels, each with its labels; throws where a label's text is not its line's (the
 * recipe file changed under the labels), so no tool judges a line by another line's label. Dishes added to the set
 * after the labels were written are left out until they are labelled.
 */
export function labelledDevRecipes(recipes: DevRecipe[] = COMFORT_DEV_SET): LabelledDevRecipe[] {
  return recipes
    .filter((r) => COMFORT_DEV_LABELS[r.id])
    .map((r) => {
      const labels = COMFORT_DEV_LABELS[r.id];
      const wrong = r.lines.findIndex((text, i) => labels[i]?.text !== text);
      if (wrong >= 0 || labels.length !== r.lines.length) throw new Error(`${r.id}: line ${wrong} "${r.lines[wrong]}" has no label of its own`);
      return { ...r, labels };
    });
}
