/**
 * A labelled panel of home-style comfort-food recipes for judging rewrites as a cook would.
 *
 * The recipes are written from general cooking knowledge (no source recipe; quantities are typical
 * home amounts, *common practice*). Each line says what a good home cook accepts when the dish is made
 * lighter. A line may always stay exactly as written; `keep` says why it usually does. A change must be
 * one of `swaps` — the substitutes a cook would use, each a
 * pattern over the USDA SR28 long description (the catalogue name) with a band on
 * grams of substitute per gram of the written food it replaces, and the largest share of the line it
 * may take (1 = the whole line; 0.5 = "up to half"). `scale` is the band of the written grams the
 * unswapped food may take ("less cheese on top" [0.5, 1], "more vegetables" [1, 1.5]); without it the
 * written grams stand (±0.5 %).
 *
 * Half the recipes are marked 'tune' and half 'held-out' by alternation in this file, fixed before any
 * rule was tuned. Tune rules only on 'tune'; the held-out figures are reported beside them.
 */

export interface PanelSwap {
  /** pattern over the catalogue name (SR28 Long_Desc), case-insensitive */
  to: string;
  /** grams of the substitute per gram of the written food it replaces */
  ratio: [number, number];
  /** the largest share of the written grams it may replace (default 1) */
  maxShare?: number;
}

export interface PanelLine {
  text: string;
  /** why the line stays exactly as written */
  keep?: string;
  swaps?: PanelSwap[];
  scale?: [number, number];
}

export interface PanelRecipe {
  id: string;
  title: string;
  servings: number;
  half: 'tune' | 'held-out';
  lines: PanelLine[];
}

export const NOT_COOKED = '^(?!.*\\b(cooked|broiled|pan-browned|pan-broiled|baked|roasted|fried|crumbles)\\b)';
export const BY_WEIGHT: [number, number] = [0.75, 1.3];

export const swap = (to: string, ratio: [number, number] = BY_WEIGHT, maxShare = 1): PanelSwap => ({ to, ratio, maxShare });

// Substitutes a cook reaches for, by class (*common practice* unless said otherwise).
export const leanGroundBeef = swap(`${NOT_COOKED}Beef, ground, 9\\d% lean`);
export const groundTurkey = swap(`${NOT_COOKED}Ground turkey`);
export const groundChicken = swap(`${NOT_COOKED}Chicken, ground`);
export const leanerMince = [leanGroundBeef, groundTurkey, groundChicken];
export const lighterMilk = swap('^Milk, (reduced fat|lowfat|nonfat), fluid', [0.8, 1.25]);
export const evaporatedSkim = swap('^Milk, canned, evaporated, nonfat', [0.6, 1.25]);
export const lighterCream = [swap('^Cream, (fluid, half and half|half and half, (lowfat|fat free)|fluid, light \\(coffee)', [0.8, 1.25]), evaporatedSkim];
export const plainYogurt = swap('^Yogurt, (Greek, plain, (nonfat|lowfat)|plain, (low fat|skim milk))', [0.7, 1.3]);
export const lighterSourCream = swap('^(Sour cream, (reduced fat|light|fat free)|Cream, sour, reduced fat)', [0.75, 1.3]);
export const reducedFatCheddar = swap('^(Cheese, cheddar, reduced fat|Cheese, low fat, cheddar|USDA commodity, cheese, cheddar, reduced fat)');
export const partSkimMozzarella = swap('^Cheese, mozzarella, .*part.skim');
export const lowFatMonterey = swap('^Cheese, monterey, low fat');
export const partSkimRicotta = swap('^Cheese, ricotta, part skim');
export const lowFatCottage = swap('^Cheese, cottage, (lowfat|nonfat)');
export const lighterCreamCheese = swap('^Cheese, (neufchatel|cream, low fat|cream, fat free)');
export const wholeGrainPasta = swap('^Pasta, (whole-wheat|whole grain).*dry');
export const proteinPasta = swap('^(Spaghetti|Macaroni), protein-fortified, dry');
export const betterPasta = [wholeGrainPasta, proteinPasta];
export const halfWholeWheatFlour = swap('^Wheat flour, whole-grain', [0.85, 1.15], 0.5);
export const eggWhites = (maxShare = 1) => [swap('^Egg, white, raw', [1.0, 1.75], maxShare), swap('^Egg substitute, liquid', [0.9, 1.75], maxShare)];
export const halfAsApplesauce = swap('^Applesauce, canned, unsweetened', [0.5, 1.3], 0.5);
export const halfAsYogurt = { ...plainYogurt, maxShare: 0.5 };
/** label rule (tests/panel/README.md): a batter's milk or buttermilk accepts up to half as plain Greek yogurt or low-fat cottage cheese, blended */
export const halfOfBatterMilk = [swap('^Yogurt, Greek, plain, (nonfat|lowfat)', [0.75, 1.3], 0.5), swap('^Cheese, cottage, (lowfat|nonfat)', [0.75, 1.3], 0.5)];
/**
 * label rule (tests/panel/README.md, round 5): the milk of a baked cheese sauce accepts up to half its weight as
 * blended low-fat cottage cheese or plain nonfat Greek yogurt, stirred in off the heat before it bakes
 */
export const halfOfBakedCheeseSauceMilk = [
  swap('^Cheese, cottage, (lowfat|nonfat)', [0.75, 1.3], 0.5),
  swap('^Yogurt, Greek, plain, (nonfat|lowfat)', [0.75, 1.3], 0.5),
];
export const chickenBreastCooked = swap(
  '^(Chicken, broilers or fryers, breast, meat only, cooked, (roasted|stewed)|Turkey, .*breast, meat only, cooked, roasted)',
  [0.8, 1.25],
);
export const chickenBreastRaw = swap('^Chicken, broilers or fryers, breast, (skinless, boneless, )?meat only.*raw', [0.8, 1.25]);
export const turkeySausage = swap(`${NOT_COOKED}(Turkey sausage|Sausage,? .*turkey)`);
export const leanPorkSausage = swap(`${NOT_COOKED}Pork sausage, link/patty, reduced fat`);
export const leanHam = swap('^(Ham, (sliced, pre-packaged|smoked, extra lean)|Canadian bacon, unprepared|Pork, cured, ham.*lean only)', [0.6, 1.3]);

/** label rule (tests/panel/README.md): a pastry lid may be phyllo sheets misted with oil, about half the pastry's weight */
export const phylloLid = swap('^Phyllo dough', [0.35, 0.7]);

/** label rule (tests/panel/README.md): a flour tortilla on the griddle accepts corn tortillas by weight */
export const cornOnGriddle = swap('^Tortillas, ready-to-bake or -fry, corn', [0.85, 1.2]);
/** label rule (tests/panel/README.md, round 7): a flour tortilla accepts a whole-wheat tortilla of the same size, tortilla for tortilla */
export const wholeWheatTortilla = swap('^Tortillas, ready-to-bake or -fry, whole wheat', [0.85, 1.15]);

export const LESS = (lo = 0.5): [number, number] => [lo, 1];
export const MORE: [number, number] = [1, 1.5];

/**
 * The main protein of a mixed dish (a casserole, layered bake, pie filling, pasta or rice dish, chili,
 * stew, a taco, quesadilla or enchilada filling; not a burger, a meatloaf or a breaded cutlet, where the
 * protein is the portion, and not a sausage or cured meat, where more is more salt and fat): a cook
 * making the dish lighter may use up to half again as much of it in its lean form (*common practice*;
 * label rule in tests/panel/README.md, applied to both halves alike). Its lean swaps accept up to ×1.5
 * by weight, and a written protein that is already lean (under 10 g fat per 100 g, FDA 21 CFR
 * 101.62(e)(2): skinless poultry meat, sirloin, canned tuna) may take ×1–1.5 as it is.
 */
export const MORE_LEAN_MAIN = 1.5;
export const moreOfLean = (swaps: PanelSwap[]): PanelSwap[] => swaps.map((s) => ({ ...s, ratio: [s.ratio[0], Math.max(s.ratio[1], MORE_LEAN_MAIN)] }));
export const MORE_LEAN: [number, number] = [1, MORE_LEAN_MAIN];

export const keepSeasoning = 'seasoning: kept as written';
export const keepLeavener = 'leavener: kept as written';
export const keepAromatic = 'aromatic: kept as written';
export const keepLiquid = 'cooking liquid: kept as written';

export const COMFORT_PANEL: PanelRecipe[] = [
  {
    id: 'baked-mac-and-cheese',
    title: 'Baked macaroni and cheese',
    servings: 6,
    half: 'tune',
    lines: [
      { text: '1 lb elbow macaroni', swaps: betterPasta },
      { text: '4 tablespoons butter', keep: 'roux: needs real fat', scale: LESS(0.6) },
      { text: '1/4 cup all-purpose flour', keep: 'roux: thickens the sauce' },
      { text: '3 cups whole milk', swaps: [lighterMilk, evaporatedSkim, ...halfOfBakedCheeseSauceMilk] },
      { text: '1 teaspoon dry mustard', keep: keepSeasoning },
      { text: '1 teaspoon salt', keep: keepSeasoning },
      { text: '1/2 teaspoon black pepper', keep: keepSeasoning },
      { text: '3 cups shredded sharp cheddar cheese', swaps: [reducedFatCheddar], scale: LESS(0.6) },
      { text: '1/2 cup dry bread crumbs', keep: 'topping crunch', scale: LESS(0.5) },
    ],
  },
  {
    id: 'lasagna',
    title: 'Meat lasagna',
    servings: 8,
    half: 'held-out',
    lines: [
      { text: '12 lasagna noodles', swaps: [wholeGrainPasta] },
      { text: '1 lb ground beef', swaps: moreOfLean(leanerMince) },
      { text: '1 lb sweet Italian sausage', swaps: [turkeySausage, leanPorkSausage], scale: LESS() },
      { text: '1 onion, chopped', keep: keepAromatic, scale: MORE },
      { text: '2 cloves garlic, minced', keep: keepAromatic },
      { text: '1 (28 oz) can crushed tomatoes', keep: 'the sauce itself' },
      { text: '2 (6 oz) cans tomato paste', keep: 'the sauce itself' },
      { text: '15 oz ricotta cheese', swaps: [partSkimRicotta, lowFatCottage] },
      { text: '1 large egg', keep: 'binds the ricotta layer', swaps: eggWhites() },
      { text: '1 lb mozzarella cheese, shredded', swaps: [partSkimMozzarella], scale: LESS(0.6) },
      { text: '3/4 cup grated Parmesan cheese', keep: 'flavour', scale: LESS() },
      { text: '2 tablespoons chopped fresh parsley', keep: keepSeasoning },
      { text: '1 teaspoon dried basil', keep: keepSeasoning },
      { text: '1 teaspoon salt', keep: keepSeasoning },
    ],
  },
  {
    id: 'fettuccine-alfredo',
    title: 'Fettuccine in cream sauce',
    servings: 4,
    half: 'tune',
    lines: [
      { text: '12 oz fettuccine', swaps: betterPasta },
      { text: '4 tablespoons butter', keep: 'sauce fat', scale: LESS() },
      { text: '1 1/2 cups heavy cream', swaps: lighterCream },
      { text: '2 cloves garlic, minced', keep: keepAromatic },
      { text: '1 cup grated Parmesan cheese', keep: 'the sauce', scale: LESS(0.6) },
      { text: '1/2 teaspoon salt', keep: keepSeasoning },
      { text: '1/4 teaspoon black pepper', keep: keepSeasoning },
      { text: '1 pinch ground nutmeg', keep: keepSeasoning },
    ],
  },
  {
    id: 'beef-chili',
    title: 'Beef and bean chili',
    servings: 6,
    half: 'held-out',
    lines: [
      { text: '2 tablespoons vegetable oil', keep: 'sautéing fat', scale: LESS(0.4) },
      { text: '2 lb ground beef', swaps: moreOfLean(leanerMince) },
      { text: '1 large onion, chopped', keep: keepAromatic, scale: MORE },
      { text: '3 cloves garlic, minced', keep: keepAromatic },
      { text: '2 tablespoons chili powder', keep: keepSeasoning },
      { text: '1 tablespoon ground cumin', keep: keepSeasoning },
      { text: '1 teaspoon salt', keep: keepSeasoning },
      { text: '1 (28 oz) can diced tomatoes', keep: 'the base of the pot' },
      { text: '2 (15 oz) cans kidney beans, drained', keep: 'beans', scale: MORE },
      { text: '1 cup beef broth', keep: keepLiquid },
      { text: '1 cup shredded cheddar cheese', swaps: [reducedFatCheddar], scale: LESS() },
      { text: '1/2 cup sour cream', swaps: [plainYogurt, lighterSourCream], scale: LESS() },
    ],
  },
  {
    id: 'meatloaf',
    title: 'Glazed meatloaf',
    servings: 6,
    half: 'tune',
    lines: [
      { text: '2 lb ground beef', swaps: leanerMince },
      { text: '1 cup dry bread crumbs', keep: 'binder' },
      { text: '2 large eggs', keep: 'binder', swaps: eggWhites() },
      { text: '1/2 cup whole milk', swaps: [lighterMilk] },
      { text: '1 onion, finely chopped', keep: keepAromatic },
      { text: '1 teaspoon salt', keep: keepSeasoning },
      { text: '1/2 teaspoon black pepper', keep: keepSeasoning },
      { text: '1 tablespoon Worcestershire sauce', keep: keepSeasoning },
      { text: '1/2 cup ketchup', keep: 'the glaze' },
    ],
  },
  {
    id: 'cottage-pie',
    title: 'Cottage pie',
    servings: 6,
    half: 'held-out',
    lines: [
      { text: '1 tablespoon olive oil', keep: 'sautéing fat', scale: LESS() },
      { text: '1 1/2 lb ground beef', swaps: moreOfLean(leanerMince) },
      { text: '1 onion, diced', keep: keepAromatic },
      { text: '2 carrots, diced', keep: 'vegetable', scale: MORE },
      { text: '1 cup frozen peas', keep: 'vegetable', scale: MORE },
      { text: '2 tablespoons tomato paste', keep: keepSeasoning },
      { text: '1 tablespoon Worcestershire sauce', keep: keepSeasoning },
      { text: '2 tablespoons all-purpose flour', keep: 'thickens the gravy' },
      { text: '1 cup beef broth', keep: keepLiquid },
      { text: '2 lb russet potatoes, peeled', keep: 'the mash', swaps: [swap('^Cauliflower, (raw|frozen, unprepared)', [0.8, 1.3], 0.5)] },
      { text: '1/2 cup whole milk', swaps: [lighterMilk] },
      { text: '4 tablespoons butter', keep: 'the mash', scale: LESS(), swaps: [halfAsYogurt] },
      { text: '1 teaspoon salt', keep: keepSeasoning },
    ],
  },
  {
    id: 'buttermilk-pancakes',
    title: 'Buttermilk pancakes',
    servings: 4,
    half: 'tune',
    lines: [
      { text: '2 cups all-purpose flour', keep: 'structure of the batter', swaps: [halfWholeWheatFlour] },
      { text: '2 tablespoons sugar', keep: 'browning', scale: LESS(0.25) },
      { text: '2 teaspoons baking powder', keep: keepLeavener },
      { text: '1/2 teaspoon baking soda', keep: keepLeavener },
      { text: '1/2 teaspoon salt', keep: keepSeasoning },
      { text: '2 cups buttermilk', keep: 'the acid for the soda', swaps: halfOfBatterMilk },
      { text: '2 large eggs', keep: 'structure', swaps: eggWhites() },
      { text: '3 tablespoons butter, melted', keep: 'tenderness', scale: LESS(), swaps: [halfAsApplesauce, halfAsYogurt] },
      { text: '1 teaspoon vanilla extract', keep: 'extract: kept as written' },
    ],
  },
  {
    id: 'fudgy-brownies',
    title: 'Fudgy brownies',
    servings: 16,
    half: 'held-out',
    lines: [
      { text: '1/2 cup butter, melted', keep: 'fudginess', swaps: [halfAsApplesauce, halfAsYogurt] },
      { text: '1 cup sugar', keep: 'structure of a brownie' },
      { text: '2 large eggs', keep: 'structure', swaps: eggWhites(0.5) },
      { text: '1 teaspoon vanilla extract', keep: 'extract: kept as written' },
      { text: '1/3 cup unsweetened cocoa powder', keep: 'the chocolate' },
      { text: '1/2 cup all-purpose flour', keep: 'structure', swaps: [halfWholeWheatFlour] },
      { text: '1/4 teaspoon salt', keep: keepSeasoning },
      { text: '1/4 teaspoon baking powder', keep: keepLeavener },
    ],
  },
  {
    id: 'carbonara',
    title: 'Spaghetti carbonara',
    servings: 4,
    half: 'tune',
    lines: [
      { text: '1 lb spaghetti', swaps: betterPasta },
      { text: '6 oz pancetta, diced', keep: 'the flavour of the dish', scale: LESS(), swaps: [leanHam] },
      { text: '3 large eggs', keep: 'the sauce needs yolks', swaps: eggWhites(0.5) },
      { text: '1 cup grated Pecorino Romano cheese', keep: 'the sauce', scale: LESS(0.6) },
      { text: '2 cloves garlic', keep: keepAromatic },
      { text: '1 teaspoon black pepper', keep: keepSeasoning },
      { text: '1/2 teaspoon salt', keep: keepSeasoning },
    ],
  },
  {
    id: 'cheeseburgers',
    title: 'Cheeseburgers',
    servings: 4,
    half: 'held-out',
    lines: [
      { text: '1 1/2 lb ground beef', swaps: leanerMince },
      { text: '4 hamburger buns', swaps: [swap('^Rolls, hamburger( or hot ?dog)?, (whole wheat|mixed-grain|wheat|reduced-calorie|whole grain)')] },
      { text: '4 slices American cheese', scale: LESS(), swaps: [swap('^Cheese, pasteurized process, American, low fat')] },
      { text: '4 leaves lettuce', keep: 'vegetable', scale: MORE },
      { text: '1 tomato, sliced', keep: 'vegetable', scale: MORE },
      { text: '2 tablespoons mayonnaise', scale: LESS(), swaps: [swap('^(Salad dressing, mayonnaise, light|Mayonnaise, reduced fat)')] },
      { text: '1/2 teaspoon salt', keep: keepSeasoning },
      { text: '1/2 teaspoon black pepper', keep: keepSeasoning },
    ],
  },
  {
    id: 'chicken-quesadillas',
    title: 'Chicken quesadillas',
    servings: 4,
    half: 'tune',
    lines: [
      { text: '4 large flour tortillas', keep: 'the wrap', swaps: [cornOnGriddle, wholeWheatTortilla] },
      { text: '2 cups shredded cooked chicken', swaps: moreOfLean([chickenBreastCooked]), scale: MORE_LEAN },
      { text: '2 cups shredded Monterey Jack cheese', swaps: [lowFatMonterey, partSkimMozzarella], scale: LESS(0.6) },
      { text: '1 tablespoon vegetable oil', keep: 'griddle fat', scale: LESS(0.3) },
      { text: '1/2 cup salsa', keep: 'sauce', scale: MORE },
      { text: '1/2 cup sour cream', swaps: [plainYogurt, lighterSourCream], scale: LESS() },
    ],
  },
  {
    id: 'homemade-pizza',
    title: 'Homemade pepperoni pizza',
    servings: 4,
    half: 'held-out',
    lines: [
      { text: '3 cups all-purpose flour', keep: 'structure of the dough', swaps: [halfWholeWheatFlour] },
      { text: '2 1/4 teaspoons active dry yeast', keep: 'yeast: kept as written' },
      { text: '1 teaspoon sugar', keep: 'feeds the yeast' },
      { text: '1 teaspoon salt', keep: keepSeasoning },
      { text: '1 cup warm water', keep: keepLiquid },
      { text: '2 tablespoons olive oil', keep: 'dough fat', scale: LESS() },
      { text: '1/2 cup pizza sauce', keep: 'sauce' },
      { text: '2 cups shredded mozzarella cheese', swaps: [partSkimMozzarella], scale: LESS(0.6) },
      { text: '3 oz sliced pepperoni', keep: 'the topping', scale: LESS() },
    ],
  },
  {
    id: 'banana-bread',
    title: 'Banana bread',
    servings: 10,
    half: 'tune',
    lines: [
      { text: '2 cups all-purpose flour', keep: 'structure', swaps: [halfWholeWheatFlour] },
      { text: '1 teaspoon baking soda', keep: keepLeavener },
      { text: '1/4 teaspoon salt', keep: keepSeasoning },
      { text: '1/2 cup butter, softened', keep: 'tenderness', swaps: [halfAsApplesauce, halfAsYogurt] },
      { text: '3/4 cup brown sugar', keep: 'moisture and browning', scale: [0.7, 1] },
      { text: '2 large eggs', keep: 'structure', swaps: eggWhites() },
      { text: '3 ripe bananas, mashed', keep: 'the flavour', scale: [1, 1.3] },
      { text: '1 teaspoon vanilla extract', keep: 'extract: kept as written' },
    ],
  },
  {
    id: 'tuna-noodle-casserole',
    title: 'Tuna noodle casserole',
    servings: 6,
    half: 'held-out',
    lines: [
      { text: '12 oz egg noodles', swaps: betterPasta },
      { text: '1 (10.5 oz) can condensed cream of mushroom soup', swaps: [swap('^Soup, cream of mushroom, canned, condensed, reduced sodium')] },
      { text: '1 cup whole milk', swaps: [lighterMilk] },
      { text: '2 (5 oz) cans tuna, drained', swaps: moreOfLean([swap('^Fish, tuna, light, canned in water', [0.8, 1.25])]), scale: MORE_LEAN },
      { text: '1 cup frozen peas', keep: 'vegetable', scale: MORE },
      { text: '1 cup shredded cheddar cheese', swaps: [reducedFatCheddar], scale: LESS() },
      { text: '1/2 cup crushed potato chips', keep: 'topping crunch', scale: LESS(0.3), swaps: [swap('^Bread crumbs, dry, grated, plain', [0.5, 1.3])] },
      { text: '2 tablespoons butter', keep: 'sauce fat', scale: LESS(0.3) },
    ],
  },
  {
    id: 'chicken-pot-pie',
    title: 'Chicken pot pie',
    servings: 6,
    half: 'tune',
    lines: [
      { text: '1/3 cup butter', keep: 'roux: needs real fat', scale: LESS(0.6) },
      { text: '1/3 cup all-purpose flour', keep: 'roux: thickens the filling' },
      { text: '1 3/4 cups chicken broth', keep: keepLiquid },
      { text: '2/3 cup whole milk', swaps: [lighterMilk, evaporatedSkim] },
      { text: '1 onion, chopped', keep: keepAromatic },
      { text: '2 carrots, diced', keep: 'vegetable', scale: MORE },
      { text: '2 stalks celery, diced', keep: 'vegetable', scale: MORE },
      { text: '1 cup frozen peas', keep: 'vegetable', scale: MORE },
      { text: '3 cups shredded cooked chicken', swaps: moreOfLean([chickenBreastCooked]), scale: MORE_LEAN },
      { text: '1 pie crust', keep: 'the lid', swaps: [phylloLid] },
      { text: '1/2 teaspoon salt', keep: keepSeasoning },
      { text: '1/4 teaspoon black pepper', keep: keepSeasoning },
      { text: '1/2 teaspoon dried thyme', keep: keepSeasoning },
    ],
  },
  {
    id: 'chicken-parmesan',
    title: 'Chicken Parmesan with spaghetti',
    servings: 4,
    half: 'held-out',
    lines: [
      { text: '4 boneless skinless chicken breasts (about 1 1/2 lb)', keep: 'already lean' },
      { text: '1 cup seasoned bread crumbs', keep: 'the coating', scale: LESS() },
      { text: '1/2 cup grated Parmesan cheese', keep: 'the coating', scale: LESS() },
      { text: '2 large eggs', keep: 'holds the coating', swaps: eggWhites() },
      { text: '1/2 cup vegetable oil', keep: 'frying fat', scale: LESS(0.2) },
      { text: '2 cups marinara sauce', keep: 'sauce' },
      { text: '1 1/2 cups shredded mozzarella cheese', swaps: [partSkimMozzarella], scale: LESS() },
      { text: '8 oz spaghetti', swaps: betterPasta },
    ],
  },
  {
    id: 'beef-tacos',
    title: 'Ground beef tacos',
    servings: 4,
    half: 'tune',
    lines: [
      { text: '1 lb ground beef', swaps: moreOfLean(leanerMince) },
      { text: '1 tablespoon vegetable oil', keep: 'sautéing fat', scale: LESS(0.3) },
      { text: '1 tablespoon chili powder', keep: keepSeasoning },
      { text: '1 teaspoon ground cumin', keep: keepSeasoning },
      { text: '1/2 teaspoon garlic powder', keep: keepSeasoning },
      { text: '1/2 teaspoon salt', keep: keepSeasoning },
      { text: '8 taco shells', keep: 'the shell', swaps: [swap('^Tortillas, ready-to-bake or -fry, corn', [0.75, 1.6])] },
      { text: '1 cup shredded cheddar cheese', swaps: [reducedFatCheddar], scale: LESS() },
      { text: '1/2 cup sour cream', swaps: [plainYogurt, lighterSourCream], scale: LESS() },
      { text: '2 cups shredded lettuce', keep: 'vegetable', scale: MORE },
      { text: '1 tomato, diced', keep: 'vegetable', scale: MORE },
    ],
  },
  {
    id: 'breakfast-casserole',
    title: 'Sausage and egg breakfast casserole',
    servings: 8,
    half: 'held-out',
    lines: [
      { text: '1 lb pork breakfast sausage', swaps: [turkeySausage, leanPorkSausage], scale: LESS() },
      { text: '6 slices white bread, cubed', swaps: [swap('^Bread, (whole-wheat|reduced-calorie|multi-grain)', [0.75, 1.3])] },
      { text: '8 large eggs', keep: 'the custard', swaps: eggWhites(0.5) },
      { text: '2 cups whole milk', swaps: [lighterMilk] },
      { text: '2 cups shredded cheddar cheese', swaps: [reducedFatCheddar], scale: LESS() },
      { text: '1 teaspoon dry mustard', keep: keepSeasoning },
      { text: '1 teaspoon salt', keep: keepSeasoning },
      { text: '1/2 teaspoon black pepper', keep: keepSeasoning },
    ],
  },
  {
    id: 'chicken-enchiladas',
    title: 'Creamy chicken enchiladas',
    servings: 6,
    half: 'tune',
    lines: [
      { text: '3 cups shredded cooked chicken', swaps: moreOfLean([chickenBreastCooked]), scale: MORE_LEAN },
      { text: '8 oz cream cheese, softened', swaps: [lighterCreamCheese] },
      { text: '1 cup sour cream', swaps: [plainYogurt, lighterSourCream] },
      { text: '2 cups shredded Monterey Jack cheese', swaps: [lowFatMonterey, partSkimMozzarella], scale: LESS() },
      { text: '10 (8 inch) flour tortillas', keep: 'the wrap', swaps: [swap('^Tortillas, ready-to-bake or -fry, corn', [0.4, 1.3]), wholeWheatTortilla] },
      { text: '1 (10 oz) can enchilada sauce', keep: 'sauce' },
      { text: '1 (4 oz) can diced green chiles', keep: 'flavour' },
      { text: '1 teaspoon ground cumin', keep: keepSeasoning },
      { text: '1/2 teaspoon salt', keep: keepSeasoning },
    ],
  },
  {
    id: 'beef-stroganoff',
    title: 'Beef stroganoff',
    servings: 4,
    half: 'held-out',
    lines: [
      { text: '1 lb beef sirloin, thinly sliced', keep: 'already a lean cut', scale: MORE_LEAN },
      { text: '2 tablespoons butter', keep: 'sautéing fat', scale: LESS() },
      { text: '8 oz mushrooms, sliced', keep: 'vegetable', scale: MORE },
      { text: '1 onion, chopped', keep: keepAromatic },
      { text: '2 tablespoons all-purpose flour', keep: 'thickens the sauce' },
      { text: '1 cup beef broth', keep: keepLiquid },
      { text: '1 cup sour cream', swaps: [swap('^Yogurt, Greek, plain, (nonfat|lowfat)', [0.7, 1.3]), lighterSourCream] },
      { text: '12 oz egg noodles', swaps: betterPasta },
      { text: '1 teaspoon salt', keep: keepSeasoning },
      { text: '1/2 teaspoon black pepper', keep: keepSeasoning },
    ],
  },
  {
    id: 'chocolate-chip-cookies',
    title: 'Chocolate chip cookies',
    servings: 24,
    half: 'tune',
    lines: [
      { text: '2 1/4 cups all-purpose flour', keep: 'structure', swaps: [halfWholeWheatFlour] },
      { text: '1 teaspoon baking soda', keep: keepLeavener },
      { text: '1 teaspoon salt', keep: keepSeasoning },
      { text: '1 cup butter, softened', keep: 'cookies need their fat to spread' },
      { text: '3/4 cup granulated sugar', keep: 'spread and crunch', scale: [0.75, 1] },
      { text: '3/4 cup packed brown sugar', keep: 'chew', scale: [0.75, 1] },
      { text: '2 large eggs', keep: 'structure' },
      { text: '2 teaspoons vanilla extract', keep: 'extract: kept as written' },
      { text: '2 cups semisweet chocolate chips', keep: 'the point of the cookie', scale: LESS() },
    ],
  },
  {
    id: 'chicken-fried-rice',
    title: 'Chicken fried rice',
    servings: 4,
    half: 'held-out',
    lines: [
      {
        text: '3 cups cooked white rice',
        swaps: [swap('^Rice, brown, .*cooked', [0.8, 1.25]), swap('^Cauliflower, (raw|frozen, unprepared)', [0.7, 1.3], 0.5)],
      },
      { text: '2 tablespoons vegetable oil', keep: 'frying fat', scale: LESS(0.4) },
      { text: '2 large eggs', keep: 'part of the dish', swaps: eggWhites() },
      { text: '1 lb boneless skinless chicken thighs, diced', swaps: moreOfLean([chickenBreastRaw]), scale: MORE_LEAN },
      { text: '1 cup frozen peas and carrots', keep: 'vegetable', scale: MORE },
      { text: '3 tablespoons soy sauce', keep: keepSeasoning, swaps: [swap('^Soy sauce.*(low sodium|reduced sodium)', [0.8, 1.25])] },
      { text: '3 green onions, sliced', keep: keepAromatic },
      { text: '2 cloves garlic, minced', keep: keepAromatic },
    ],
  },
];
