/**
 * Reads the text of a Nutrition Facts panel (as OCR gives it) into the per-serving values of the label
 * form. Pure: the server runs it on tesseract.js's text, the tests on text samples.
 *
 * Decisions:
 * - "Less than 1g" (or "<1g") is read as 0.5 g: FDA 21 CFR 101.9(c) prints it for 0.5 g up to 1 g,
 *   so 0.5 is the least the food holds and the saved food never claims more than its panel. In
 *   general "less than X" reads as X / 2, with a note for the cook to check.
 * - OCR often reads the unit "g" as the digit "9" ("2.59", "(459)") and "0" as the letter "O". An
 *   amount with no unit that ends in 9 is read both ways; the reading that lies on the panel's own
 *   rounding grid (fat to 0.5 g under 5 g, other grams to 1 g) and agrees with a printed % Daily
 *   Value wins.
 * - Thousands separators ("1,200mg") are read; a panel is US-style, so a comma is never a decimal point.
 */
import type { LabelScanFields } from './schemas/foods';

export type LabelField = keyof LabelScanFields;

/**
 * Daily Values for adults and children 4 years and over, FDA 21 CFR 101.9(c)(8)(iv) (2016 rule;
 * from memory): used only to choose between two OCR readings of one amount.
 */
export const DAILY_VALUES: Partial<Record<LabelField, number>> = { fatG: 78, satFatG: 20, sodiumMg: 2300, carbsG: 275, fiberG: 28, proteinG: 50 };

export interface LabelReading {
  fields: LabelScanFields;
  /** which of the ten fields were found */
  found: LabelField[];
  /** fields read as printed that OCR may have garbled ("289g" for "28g"): worth a second reading */
  doubtful: LabelField[];
  notes: string[];
}

const FIELD_WORDS: Record<Exclude<LabelField, 'servingSizeG' | 'servingSizeMl' | 'servingLabel' | 'kcal'>, string> = {
  fatG: 'Total fat',
  satFatG: 'Saturated fat',
  carbsG: 'Total carbohydrate',
  fiberG: 'Dietary fiber',
  sugarG: 'Total sugars',
  proteinG: 'Protein',
  sodiumMg: 'Sodium',
};

/** Name patterns of each amount line; the first that matches wins. `(?<!…)` keeps "Added Sugars" out of sugars. */
const NAMES: Record<keyof typeof FIELD_WORDS, RegExp[]> = {
  fatG: [/\btotal\s*fat\b/gi, /(?<!sat(?:urated|\.)?\s{0,2}|trans\s{0,2}|from\s{0,2})\bfat\b(?!\s*free)/gi],
  satFatG: [/\bsat(?:urated|\.)?\s*fat\b/gi],
  carbsG: [/\btotal\s*carb(?:ohydrates?|s|\.)?/gi, /\bcarbohydrates?\b/gi],
  fiberG: [/\b(?:dietary|total)\s*fib(?:er|re)\b/gi, /\bfib(?:er|re)\b/gi],
  sugarG: [/\btotal\s*sugars?\b/gi, /(?<!added\s{0,3})\bsugars\b/gi],
  proteinG: [/\bprotein\b/gi],
  sodiumMg: [/\bsodium\b/gi],
};

/** An amount after a nutrient's name: "2.5g", "0 g", "Og", "Less than 1g", "<1g", "450mg", "1,200 mg", "2.59". */
const AMOUNT = /^[\s:.,-]*(less\s*than\s*|<\s*)?(\d{1,3}(?:,\d{3})+|\d+(?:\.\d+)?|\.\d+|[Oo](?=\s*m?[gq9]\b))\s*(mg|m9|mq|g|q|¢)?(?![\d.]*[ \t]*%)/i;

const PERCENT = /^[^%\n]{0,14}?(\d{1,3})\s*%/;

function onGrid(field: LabelField, value: number) {
  if (field === 'sodiumMg') return value < 5 ? value === 0 : value <= 140 ? value % 5 === 0 : value % 10 === 0;
  if (field === 'fatG' || field === 'satFatG') return value < 0.5 ? value === 0 : value < 5 ? (value * 2) % 1 === 0 : value % 1 === 0;
  return value < 0.5 ? value === 0 : value % 1 === 0;
}

function number(text: string) {
  if (/^[Oo]$/.test(text)) return 0;
  return Number(text.replace(/,/g, ''));
}

interface Amount {
  value: number;
  lessThan: boolean;
  reread: boolean;
  /** read as printed, though it ends in a 9 that may be a misread "g" and no % Daily Value settled it */
  doubtful: boolean;
}

/** The readings an OCR'd amount allows, best first. */
function readAmount(field: LabelField, after: string): Amount | null {
  const m = AMOUNT.exec(after);
  if (!m) return null;
  const lessThan = Boolean(m[1]);
  const digits = m[2];
  const unit = m[3]?.toLowerCase() ?? '';
  const value = number(digits);
  if (!Number.isFinite(value)) return null;
  const candidates: { value: number; reread: boolean; needsPercent: boolean }[] = [{ value, reread: false, needsPercent: false }];
  const plain = digits.replace(/,/g, '');
  // "2.59" for "2.5g", "199" for "19g": a unit read as a 9 (or a 9 followed by a stray unit character).
  if ((unit === '' || unit === 'q' || unit === '¢') && /\d9$/.test(plain))
    candidates.push({ value: number(plain.slice(0, -1)), reread: true, needsPercent: false });
  // "199g" for "19g": the g doubled as "9g"; taken only when the printed % Daily Value says so.
  else if ((unit === 'g' || unit === 'mg') && /\d9$/.test(plain)) candidates.push({ value: number(plain.slice(0, -1)), reread: true, needsPercent: true });
  if (candidates.length > 1 && !lessThan) {
    const dv = DAILY_VALUES[field];
    const pct = PERCENT.exec(after.slice(m[0].length));
    const agrees = (c: { value: number }) => Boolean(dv && pct && Math.abs((c.value / dv) * 100 - Number(pct[1])) <= 1.5);
    const score = (c: { value: number; needsPercent: boolean }) => {
      if (c.needsPercent && !agrees(c)) return 99;
      let s = onGrid(field, c.value) ? 0 : 2;
      if (dv && pct) s += agrees(c) ? 0 : 3;
      return s;
    };
    candidates.sort((a, b) => score(a) - score(b));
  }
  const best = candidates[0];
  const doubtful = candidates.length > 1 && !best.reread && !(DAILY_VALUES[field] && PERCENT.test(after.slice(m[0].length)));
  return { value: lessThan ? best.value / 2 : best.value, lessThan, reread: best.reread, doubtful };
}

function findAmount(text: string, field: keyof typeof FIELD_WORDS): Amount | null {
  for (const name of NAMES[field]) {
    name.lastIndex = 0;
    let m: RegExpExecArray | null;
    while ((m = name.exec(text))) {
      const after = text.slice(m.index + m[0].length, m.index + m[0].length + 40);
      if (field === 'sugarG' && /^\s*(?:alcohols?|added)/i.test(after)) continue;
      const amount = readAmount(field, after);
      if (amount) return amount;
    }
  }
  return null;
}

function cleanMeasure(text: string) {
  return text
    .replace(/\s+/g, ' ')
    .replace(/^[\s:.,-]+|[\s:.,;-]+$/g, '')
    .trim();
}

/** "1 tortilla (45g)", "2/3 cup (55g)", "45g (1 tortilla)", "1 cup (240mL)", "17 slices (30g)". */
function readServing(text: string, fields: LabelScanFields, notes: string[], doubtful: LabelField[]) {
  const m = /se[rn][vu]ing\s*s[il1]ze\s*:?\s*([^\n]*)/i.exec(text);
  if (!m) return;
  let line = m[1];
  // In a one-line panel the next nutrient follows on the same line.
  const cut = /\b(?:calories|amount\s+per|servings?\s+per)\b/i.exec(line);
  if (cut) line = line.slice(0, cut.index);
  const qty = String.raw`(\d+(?:\.\d+)?)`;
  const grams = new RegExp(`${qty}\\s*(g|ml|mL|9)(?![a-z])`, 'i');
  const inParens = /\(([^)]*)\)?/.exec(line);
  let household = line;
  let metric: RegExpExecArray | null = null;
  if (inParens) {
    metric = grams.exec(inParens[1]);
    if (!metric) {
      // "(459)", "(1500)": a metric amount always has a unit, so a bare number's last 9 or 0 was its "g".
      const bare = /^\s*(?:about\s*)?(\d+)[90]\s*$/i.exec(inParens[1]);
      if (bare) {
        metric = Object.assign([`${bare[1]}g`, bare[1], 'g'], { index: 0, input: inParens[1] }) as unknown as RegExpExecArray;
        notes.push(`Serving size: read “(${inParens[1].trim()})” as ${bare[1]} g.`);
      }
    }
    household = line.slice(0, inParens.index);
    if (metric && cleanMeasure(household) === '') household = inParens[1].replace(metric[0], '');
  }
  if (!metric) {
    metric = grams.exec(line);
    if (metric) household = line.replace(metric[0], '');
  }
  if (metric) {
    const value = Number(metric[1]);
    const unit = metric[2].toLowerCase();
    if (unit === 'ml') fields.servingSizeMl = value;
    else fields.servingSizeG = value;
    if (unit === '9') notes.push(`Serving size: read “${metric[0]}” as ${value} g.`);
    else if (/\d9$/.test(metric[1])) doubtful.push(unit === 'ml' ? 'servingSizeMl' : 'servingSizeG');
  }
  const label = cleanMeasure(household.replace(/[()]/g, ' '));
  if (label && /\d|[¼½¾⅓⅔⅛]/.test(label)) fields.servingLabel = label;
}

function readCalories(text: string): number | null {
  const re = /\bcalories\b(?!\s*from)\s*:?\s*(\d{1,4})(?!\d)(?![ \t]*%)/gi;
  const m = re.exec(text);
  return m ? Number(m[1]) : null;
}

export function emptyScanFields(): LabelScanFields {
  return {
    servingSizeG: null,
    servingSizeMl: null,
    servingLabel: null,
    kcal: null,
    fatG: null,
    satFatG: null,
    carbsG: null,
    fiberG: null,
    sugarG: null,
    proteinG: null,
    sodiumMg: null,
  };
}

/** The ten fields of a panel's text; those it could not find stay null. */
export function readLabelText(raw: string): LabelReading {
  const text = raw.replace(/\r\n?/g, '\n').replace(/[|]/g, ' ');
  const fields = emptyScanFields();
  const notes: string[] = [];
  const doubtful: LabelField[] = [];
  readServing(text, fields, notes, doubtful);
  fields.kcal = readCalories(text);
  for (const field of Object.keys(FIELD_WORDS) as (keyof typeof FIELD_WORDS)[]) {
    const amount = findAmount(text, field);
    if (!amount) continue;
    fields[field] = amount.value;
    if (amount.doubtful) doubtful.push(field);
    const unit = field === 'sodiumMg' ? 'mg' : 'g';
    if (amount.lessThan)
      notes.push(`${FIELD_WORDS[field]} said “less than ${amount.value * 2} ${unit}”: read as ${amount.value} ${unit}, the least it can be. Check it.`);
    if (amount.reread) notes.push(`${FIELD_WORDS[field]}: a “g” may have been read as a 9; read as ${amount.value} ${unit}.`);
  }
  const found = (Object.keys(fields) as LabelField[]).filter((k) => fields[k] !== null && !(k === 'servingSizeMl' && fields.servingSizeG !== null));
  return { fields, found, doubtful, notes };
}

/**
 * Two readings of one photo combined: the second fills what the first missed and replaces what the
 * first read doubtfully, when the second read it plainly.
 */
export function mergeReadings(first: LabelReading, second: LabelReading): LabelReading {
  const fields = { ...first.fields };
  const doubtful: LabelField[] = [];
  for (const key of Object.keys(fields) as LabelField[]) {
    const other = second.fields[key];
    if (other === null) {
      if (first.doubtful.includes(key)) doubtful.push(key);
      continue;
    }
    if (fields[key] === null || (first.doubtful.includes(key) && !second.doubtful.includes(key))) (fields as Record<string, unknown>)[key] = other;
    else if (first.doubtful.includes(key)) doubtful.push(key);
  }
  if (fields.servingSizeG !== null) fields.servingSizeMl = first.fields.servingSizeG !== null ? first.fields.servingSizeMl : second.fields.servingSizeMl;
  const found = (Object.keys(fields) as LabelField[]).filter((k) => fields[k] !== null && !(k === 'servingSizeMl' && fields.servingSizeG !== null));
  return { fields, found, doubtful, notes: [...new Set([...first.notes, ...second.notes])] };
}
