/**
 * Reads a recipe as cooks paste it — a title, "Serves 6", an "Ingredients" heading, sub-headings
 * such as "For the sauce:", then the method — and keeps the ingredient lines apart from the rest.
 * Used for pasted text in the Kitchen and for uploaded .txt/.md recipes, so both read alike.
 */

export type SetAsideReason = 'title' | 'heading' | 'servings' | 'method' | 'note';

export interface SetAsideLine {
  text: string;
  why: SetAsideReason;
}

export interface RecipeText {
  /** the line above the ingredients that names the dish, when the text has one */
  title: string | null;
  /** from a "Serves 6" or "Makes 12" line */
  servings: number | null;
  ingredients: string[];
  /** method steps, numbering and bullets removed */
  method: string[];
  notes: string[];
  /** every non-blank line that is not an ingredient, in order, with why */
  setAside: SetAsideLine[];
}

const HEADING = /^\s*(?:#{1,6}\s*)?([A-Za-z][A-Za-z '’]{1,40}?)\s*:?\s*$/;
const INGREDIENT_HEADINGS = /^(ingredients?|you(?:'|’)ll need|what you(?:'|’)ll need|what you need|shopping( list)?)$/i;
const METHOD_HEADINGS = /^(method|instructions?|directions?|steps?|preparation|how to make it)$/i;
const NOTE_HEADINGS = /^(notes?|tips?|storage|to store)$/i;
const SERVINGS_LINE = /^\s*(?:serves|servings?|makes|yield|yields|portions?)\b\s*:?\s*(\d+)/i;
/** "For the sauce:", "Topping:" — a short label ending in a colon, with no amount in it. */
const SUB_HEADING = /^\s*(?:#{1,6}\s*)?(?:for\s+the\s+)?[A-Za-z][A-Za-z ,&'’-]{0,40}:\s*$/i;
const BULLET = /^\s*(?:[-*•·▢□☐]|\[[ x]\])\s*/iu;
const NUMBERED = /^\s*\d+[.)](?=\s)\s*/;
const STARTS_WITH_AMOUNT = /^\s*(?:[-*•]\s+)?[\d½¼¾⅓⅔⅛⅜⅝⅞]/;

function headingWord(line: string): string | null {
  const m = line.match(HEADING);
  return m ? m[1].trim() : null;
}

/** The ingredient a bullet or numbered line holds, its mark removed. */
export function stripListMark(line: string): string {
  return line.replace(BULLET, '').replace(NUMBERED, '').trim();
}

/**
 * Splits recipe text into its parts. Text with no "Ingredients" or method heading is read as a plain
 * ingredient list (every line an ingredient except sub-headings ending in a colon), because that is
 * what the Kitchen asks for; `untitledLead` says how to read lines before the ingredients when there
 * is no heading at all ('ingredients' for the Kitchen, 'title-and-notes' for an uploaded file).
 */
export function readRecipeText(text: string, untitledLead: 'ingredients' | 'title-and-notes' = 'ingredients'): RecipeText {
  const lines = text
    .split(/\r\n|\r|\n/)
    .map((l) => l.trim())
    .filter((l) => l.length > 0);
  const headings = lines.map(headingWord);
  const hasIngredientHeading = headings.some((w) => w !== null && INGREDIENT_HEADINGS.test(w));
  const hasMethodHeading = headings.some((w) => w !== null && METHOD_HEADINGS.test(w));
  const out: RecipeText = { title: null, servings: null, ingredients: [], method: [], notes: [], setAside: [] };
  let section: 'head' | 'ingredients' | 'method' | 'notes' = hasIngredientHeading || untitledLead === 'title-and-notes' ? 'head' : 'ingredients';
  // A pasted list followed by a method: its first line, if it has no amount, names the dish.
  const first = lines[0];
  if (
    section === 'ingredients' &&
    hasMethodHeading &&
    first !== undefined &&
    headingWord(first) !== null &&
    !STARTS_WITH_AMOUNT.test(first) &&
    !BULLET.test(first)
  ) {
    const w = headingWord(first);
    if (w !== null && !METHOD_HEADINGS.test(w)) {
      out.title = first.replace(/^#+\s*/, '').trim();
      out.setAside.push({ text: first, why: 'title' });
      lines.shift();
    }
  }
  for (const line of lines) {
    const word = headingWord(line);
    if (word !== null && INGREDIENT_HEADINGS.test(word)) {
      section = 'ingredients';
      out.setAside.push({ text: line, why: 'heading' });
      continue;
    }
    if (word !== null && METHOD_HEADINGS.test(word)) {
      section = 'method';
      out.setAside.push({ text: line, why: 'heading' });
      continue;
    }
    if (word !== null && NOTE_HEADINGS.test(word) && section !== 'head') {
      section = 'notes';
      out.setAside.push({ text: line, why: 'heading' });
      continue;
    }
    const servings = line.match(SERVINGS_LINE);
    if (servings && out.servings === null && line.length < 60 && section !== 'method') {
      out.servings = Number(servings[1]);
      out.setAside.push({ text: line, why: 'servings' });
      continue;
    }
    if (section === 'method') {
      out.method.push(stripListMark(line));
      out.setAside.push({ text: line, why: 'method' });
      continue;
    }
    if (section === 'notes') {
      out.notes.push(line);
      out.setAside.push({ text: line, why: 'note' });
      continue;
    }
    if (SUB_HEADING.test(line)) {
      out.setAside.push({ text: line, why: 'heading' });
      continue;
    }
    if (section === 'head') {
      if (out.title === null && !STARTS_WITH_AMOUNT.test(line)) {
        out.title = line.replace(/^#+\s*/, '').trim();
        out.setAside.push({ text: line, why: 'title' });
      } else if (BULLET.test(line) || STARTS_WITH_AMOUNT.test(line)) {
        out.ingredients.push(stripListMark(line));
      } else {
        out.notes.push(line);
        out.setAside.push({ text: line, why: 'note' });
      }
      continue;
    }
    const item = stripListMark(line);
    if (item) out.ingredients.push(item);
  }
  return out;
}
