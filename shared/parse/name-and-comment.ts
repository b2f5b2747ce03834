/**
 * Split an ingredient description ("shredded mozzarella cheese, divided (optional)") into the food
 * phrase ("mozzarella cheese"), its preparation ("shredded") and the rest of the notes.
 *
 * Preparation words say what the cook does to a food, not which food it is: "shredded cheese" is
 * weighed as cheese with a "shredded" household portion. Words that name a different food in a
 * nutrient table ("ground beef", "dried sage", "cooked rice", "toasted sesame oil", "salted butter")
 * stay in the name.
 */

/** Words that only ever describe what is done to a food. */
const PREP_WORDS = new Set([
  'beaten',
  'blanched',
  'boned',
  'broken',
  'chilled',
  'chopped',
  'chiffonaded',
  'cleaned',
  'coarsely',
  'cored',
  'crumbled',
  'crushed',
  'cubed',
  'cut',
  'deboned',
  'deseeded',
  'destemmed',
  'deveined',
  'diced',
  'divided',
  'drained',
  'finely',
  'flaked',
  'grated',
  'halved',
  'hulled',
  'julienned',
  'lightly',
  'mashed',
  'melted',
  'minced',
  'packed',
  'pitted',
  'peeled',
  'pounded',
  'pureed',
  'puréed',
  'quartered',
  'rinsed',
  'roughly',
  'scrubbed',
  'seeded',
  'separated',
  'shaved',
  'shelled',
  'shredded',
  'sifted',
  'sliced',
  'slivered',
  'snipped',
  'softened',
  'stemmed',
  'thawed',
  'thinly',
  'torn',
  'trimmed',
  'warmed',
  'washed',
  'whisked',
  'zested',
  'juiced',
  'squeezed',
  'spiralized',
  'cracked',
  'loosely',
  'firmly',
  'thickly',
  'freshly',
  'crosswise',
  'lengthwise',
  'diagonally',
  'evenly',
  'tightly',
  'gently',
  'room-temperature',
  'chunked',
  'smashed',
  'bruised',
  'hand-torn',
  'picked',
  'scooped',
  'leveled',
  'levelled',
  'sieved',
  'strained',
  'unpeeled',
  'uncooked',
  'defrosted',
  'soaked',
  'patted',
  'segmented',
  'sectioned',
  'skinned',
]);
/** Joiners inside a preparation phrase: "peeled and finely chopped". */
const PREP_JOINERS = new Set(['and', 'or', 'then', 'very', 'well', 'extra', '&']);
/**
 * -ed words that name a different food (a nutrient table lists cooked rice apart from raw rice),
 * so they stay in the name even though they look like preparation.
 */
const FOOD_STATE_WORDS = new Set([
  'cooked',
  'dried',
  'smoked',
  'canned',
  'salted',
  'unsalted',
  'roasted',
  'toasted',
  'sweetened',
  'unsweetened',
  'fried',
  'baked',
  'boiled',
  'pickled',
  'cured',
  'aged',
  'whipped',
  'condensed',
  'evaporated',
  'powdered',
  'creamed',
  'refried',
  'fermented',
  'reduced',
  'enriched',
  'bleached',
  'unbleached',
  'rolled',
  'steel-cut',
  'puffed',
  'grilled',
  'steamed',
  'braised',
  'poached',
  'sprouted',
  'marinated',
  'preserved',
  'candied',
  'clarified',
  'browned',
  'flavored',
  'flavoured',
  'seasoned',
  'concentrated',
  'filtered',
  'distilled',
  'spiced',
  'infused',
  'stuffed',
  'mixed',
  'assorted',
  'frozen',
  'crystallized',
  'iced',
  'hard-boiled',
  'soft-boiled',
]);
/** "freshly ground pepper", "finely ground cornmeal": ground after an adverb is preparation. */
const GROUND_AFTER = new Set(['freshly', 'finely', 'coarsely']);
/** Single adjectives that open a comma-joined food phrase: "boneless, skinless chicken thighs". */
const LEADING_ADJECTIVES = new Set([
  'boneless',
  'skinless',
  'skin-on',
  'bone-in',
  'soft',
  'dark',
  'thick',
  'thin',
  'mild',
  'plain',
  'good',
  'fresh',
  'raw',
  'hot',
  'sweet',
  'firm',
  'ripe',
  'whole',
  'lean',
  'large',
  'medium',
  'small',
  'big',
  'fine',
  'coarse',
  'light',
  'organic',
  'crisp',
  'crusty',
  'smooth',
  'creamy',
  'chunky',
  'salty',
  'spicy',
  'fruity',
  'bitter',
  'semisweet',
  'bittersweet',
  'low-fat',
  'full-fat',
  'fat-free',
  'nonfat',
  'reduced-fat',
  'day-old',
  'extra-virgin',
  'young',
  'mature',
  'soft-ripened',
  'industrial',
  'rustic',
  'hearty',
  'tender',
  'tart',
  'firm-ripe',
  'sharp',
  'aged',
  'good-quality',
  'high-quality',
  'quality',
  'juicy',
  'crunchy',
  'sturdy',
]);

/** Phrases that end the food phrase and begin a note, even without a comma. */
const NOTE_PHRASE = new RegExp(
  String.raw`\s*,?\s*(?:\b(?:to taste|as needed|as desired|if desired|if needed|if using|if you like|or to taste|or as needed|` +
    String.raw`for [a-z-]+ing\b|for (?:garnish|serving|the [a-z]+|decoration)|` +
    String.raw`plus|at room temperature|room temperature|optional|such as|like|preferably|ideally|dissolved in|mixed with|` +
    String.raw`cut into|cut in|trimmed of|cooked to|to sprinkle|to deglaze|to thicken|to serve|to finish|to garnish|` +
    String.raw`in a spray bottle|per person|per serving|divided|see note|see recipe|recipe follows|from \d)\b|` +
    String.raw`\s(?:or|and)\s+(?=\d+(?:[./]\d+)?(?:-\d+)?\s+\p{L})|\s\+\s)`,
  'iu',
);

export interface NameParts {
  name: string;
  preparation: string | null;
  comment: string | null;
  optional: boolean;
  toTaste: boolean;
}

/** Remove every parenthetical (balanced, or unclosed to the end) and return them separately. */
export function takeParentheticals(text: string): { rest: string; notes: string[] } {
  const notes: string[] = [];
  let rest = '';
  let depth = 0;
  let current = '';
  for (const ch of text) {
    if (ch === '(' || ch === '[') {
      if (depth > 0) current += ch;
      depth++;
    } else if ((ch === ')' || ch === ']') && depth > 0) {
      depth--;
      if (depth === 0) {
        if (current.trim()) notes.push(current.trim());
        current = '';
        rest += ' ';
      } else current += ch;
    } else if (depth > 0) current += ch;
    else rest += ch;
  }
  if (depth > 0 && current.trim()) notes.push(current.trim());
  return { rest: rest.replace(/\s+/g, ' ').trim(), notes };
}

function words(text: string): string[] {
  return text.trim().split(/\s+/).filter(Boolean);
}

function isPrepWord(word: string, previous: string | undefined): boolean {
  const w = word.toLowerCase();
  if (PREP_WORDS.has(w)) return true;
  if (w === 'ground' && previous !== undefined && GROUND_AFTER.has(previous.toLowerCase())) return true;
  // "1/4-inch diced": a cut size inside a preparation phrase.
  return /^\d[\d/.]*-(?:inch|in|cm|mm)$/.test(w);
}

/** True when the text opens with a preparation word ("finely chopped", "peeled and minced", "ground"). */
export function startsWithPrep(text: string): boolean {
  const first = words(text)[0]?.toLowerCase();
  if (!first) return false;
  if (PREP_WORDS.has(first) || first === 'ground') return true;
  return /^[a-z-]{3,}ed$/.test(first) && !FOOD_STATE_WORDS.has(first) && first !== 'red';
}

/** Take preparation words off the front of a food phrase: "finely chopped fresh parsley". */
function takeLeadingPrep(text: string): { prep: string | null; rest: string } {
  const ws = words(text);
  let i = 0;
  let lastPrep = 0;
  while (i < ws.length - 1) {
    const w = ws[i].toLowerCase();
    if (isPrepWord(w, ws[i - 1]) && !(i === 0 && /^\d/.test(w))) {
      i++;
      lastPrep = i;
      continue;
    }
    // "toasted and finely chopped hazelnuts": a food-state word is preparation only when joined to one.
    if (i === lastPrep && FOOD_STATE_WORDS.has(w) && ['and', 'or', '&'].includes(ws[i + 1]?.toLowerCase() ?? '')) {
      i++;
      continue;
    }
    if (i > 0 && PREP_JOINERS.has(w)) {
      i++;
      continue;
    }
    break;
  }
  if (lastPrep === 0) return { prep: null, rest: text };
  return { prep: ws.slice(0, lastPrep).join(' '), rest: ws.slice(lastPrep).join(' ') };
}

/** Take trailing preparation words off a food phrase written without a comma: "butter packed". */
function takeTrailingPrep(text: string): { prep: string | null; rest: string } {
  const ws = words(text);
  let i = ws.length;
  while (i > 1 && PREP_WORDS.has(ws[i - 1].toLowerCase()) && !/ly$/.test(ws[i - 1])) i--;
  if (i === ws.length) return { prep: null, rest: text };
  return { prep: ws.slice(i).join(' '), rest: ws.slice(0, i).join(' ') };
}

function tidy(text: string): string {
  return text
    .replace(/\s+/g, ' ')
    .replace(/^[\s,;:.*\-–—~+]+|[\s,;:*\-–—~+]+$/g, '')
    .replace(/^(?:of|the|each)\s+/i, '')
    .trim();
}

/** A comma segment that closes a list of foods: "or other white beans", "Corn Chex or Chocolate Chex". */
function closesFoodList(segment: string): boolean {
  if (/\d/.test(segment) || startsWithPrep(segment.replace(/^(?:or|and)\s+/i, ''))) return false;
  if (/^(?:or|and)\s+(?:a bit|more|less|to|as|use|substitute|see|any|if|for)\b/i.test(segment)) return false;
  // "fresh or frozen", "salted or unsalted", "more or less": a choice of state, not of food.
  if (words(segment).every((w) => /^(?:or|and|more|less)$/i.test(w) || LEADING_ADJECTIVES.has(w.toLowerCase()) || FOOD_STATE_WORDS.has(w.toLowerCase())))
    return false;
  return /^(?:or|and)\s+/i.test(segment) || (/\bor\b/i.test(segment) && words(segment).length <= 6);
}

/** True when every word describes a food without naming one: "roasted", "dry", "unsalted high-fat". */
function describesOnly(text: string): boolean {
  const ws = words(text).map((w) => w.toLowerCase());
  return (
    ws.length > 0 &&
    ws.length <= 3 &&
    ws.every(
      (w) =>
        LEADING_ADJECTIVES.has(w) ||
        FOOD_STATE_WORDS.has(w) ||
        PREP_WORDS.has(w) ||
        /^[a-z-]{3,}ed$/.test(w) ||
        /(?:less|ful|-style|-fat|-free)$/.test(w) ||
        w === 'dry',
    )
  );
}

/** Split the food phrase from the notes that follow its commas. */
function splitSegments(text: string): { head: string; prep: string[]; tail: string[] } {
  const segments = text
    .split(/\s*,\s*/)
    .map((s) => s.trim())
    .filter(Boolean);
  const prep: string[] = [];
  let i = 0;
  // "peeled, chopped apple", "crushed, roasted peanuts": leading segments made only of preparation.
  while (i < segments.length - 1) {
    const lead = takeLeadingPrep(`${segments[i]} x`);
    if (lead.prep && lead.rest === 'x') {
      prep.push(segments[i]);
      i++;
    } else if (
      words(segments[i]).length === 1 &&
      /^[\p{L}-]+ed$/u.test(segments[i]) &&
      !FOOD_STATE_WORDS.has(segments[i].toLowerCase()) &&
      !startsWithPrep(segments[i + 1])
    ) {
      prep.push(segments[i]);
      i++;
    } else break;
  }
  let head = segments[i] ?? '';
  i++;
  // "boneless, skinless chicken thighs", "dark, bittersweet, or semisweet chocolate chips".
  while (
    i < segments.length &&
    words(head).length === 1 &&
    (LEADING_ADJECTIVES.has(head.toLowerCase()) || FOOD_STATE_WORDS.has(head.toLowerCase()) || /(?:less|ful)$/i.test(head)) &&
    !startsWithPrep(segments[i]) &&
    !/^(?:or|and)\b/i.test(segments[i])
  ) {
    head = `${head} ${segments[i]}`;
    i++;
  }
  // "roasted, peeled poblano chiles", "dry, curly lasagna noodles", "unsalted high-fat, European-style
  // butter": a head of describing words only names no food; the food follows the comma.
  if (i < segments.length && describesOnly(head) && !/^(?:or|and)\b/i.test(segments[i])) {
    const lead = takeLeadingPrep(`${segments[i]}`);
    if (lead.rest && !describesOnly(lead.rest)) {
      if (lead.prep) prep.push(lead.prep);
      head = `${head} ${lead.rest}`;
      i++;
    }
  }
  // "bucatini, tagliatelle, or other long pasta, cut...": a list of foods is one food phrase.
  for (let k = i; k < segments.length && k < i + 6; k++) {
    if (startsWithPrep(segments[k]) || words(segments[k]).length > 6) break;
    if (closesFoodList(segments[k])) {
      head = [head, ...segments.slice(i, k + 1)].join(', ');
      i = k + 1;
      break;
    }
  }
  return { head, prep, tail: segments.slice(i) };
}

export function splitNameAndComment(description: string): NameParts {
  const notes: string[] = [];
  const prepParts: string[] = [];
  const { rest: withoutParens, notes: parenNotes } = takeParentheticals(description);
  let text = withoutParens;
  // "linguine (or bucatini)": an alternative stays a note, so the name is one food to look up.
  notes.push(...parenNotes);

  let phraseTail: string | null = null;
  const phrase = text.match(NOTE_PHRASE);
  if (phrase && phrase.index !== undefined && phrase.index > 0) {
    phraseTail = text.slice(phrase.index).replace(/^\s*,?\s*(?:\+\s*)?/, '');
    text = text.slice(0, phrase.index);
  }
  const semi = text.indexOf(';');
  if (semi > 0) {
    notes.unshift(text.slice(semi + 1).trim());
    text = text.slice(0, semi);
  }

  const split = splitSegments(text);
  prepParts.push(...split.prep);
  const lead = takeLeadingPrep(tidy(split.head));
  if (lead.prep) prepParts.push(lead.prep);
  let name = lead.rest;
  const trail = takeTrailingPrep(name);
  if (trail.prep) {
    prepParts.push(trail.prep);
    name = trail.rest;
  }
  const tailNotes: string[] = [];
  for (const seg of split.tail) (startsWithPrep(seg) ? prepParts : tailNotes).push(seg);
  if (phraseTail) (startsWithPrep(phraseTail) ? prepParts : tailNotes).push(phraseTail);

  name = tidy(name);
  if (name === '') name = tidy(withoutParens) || tidy(description);

  const all = [...prepParts, ...tailNotes, ...notes].map((s) => s.trim()).filter(Boolean);
  const lower = description.toLowerCase();
  return {
    name,
    preparation: prepParts.length ? prepParts.join(', ') : null,
    comment: all.length ? all.join(', ') : null,
    optional: /\boptional\b/.test(lower),
    toTaste: /\bto taste\b/.test(lower),
  };
}

/** Counted units cooks write after the food: "4 garlic cloves", "3 celery stalks". */
const TRAILING_COUNT_UNITS: Record<string, string> = {
  clove: 'clove',
  cloves: 'clove',
  stalk: 'stalk',
  stalks: 'stalk',
  sprig: 'sprig',
  sprigs: 'sprig',
  slice: 'slice',
  slices: 'slice',
  spear: 'spear',
  spears: 'spear',
  bulb: 'bulb',
  bulbs: 'bulb',
  head: 'head',
  heads: 'head',
  wedge: 'wedge',
  wedges: 'wedge',
};

/** "garlic cloves" → unit clove, name "garlic"; "clove garlic" → the same. */
export function takeCountUnitFromName(name: string): { unit: string; unitText: string; name: string } | null {
  const ws = words(name);
  if (ws.length < 2) return null;
  const last = ws[ws.length - 1];
  const lastUnit = TRAILING_COUNT_UNITS[last.toLowerCase()];
  if (lastUnit) return { unit: lastUnit, unitText: last, name: ws.slice(0, -1).join(' ') };
  const first = ws[0];
  const firstUnit = TRAILING_COUNT_UNITS[first.toLowerCase()];
  if (firstUnit)
    return {
      unit: firstUnit,
      unitText: first,
      name: ws
        .slice(1)
        .join(' ')
        .replace(/^of\s+/i, ''),
    };
  return null;
}
