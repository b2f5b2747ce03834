import { badRequest } from '../lib/http-error';
import { readRecipeText } from '../../shared/recipe-text';
import { exportedVersionsSchema, type ExportedVersion } from '../../shared/schemas/recipe-jsonld';

export interface ImportedRecipe {
  title: string;
  servings: number;
  ingredients: string[];
  method: string;
  notes: string;
  format: 'json-ld' | 'text';
  /** every version with its foods and grams, from Hearthswap's own export (`hearthswap:versions`) */
  versions?: ExportedVersion[];
}

const MAX_SERVINGS = 100;
/** schema.org Recipe files nest a few levels (graph → recipe → sections → steps); 64 is generous. */
export const MAX_JSON_DEPTH = 64;

/** The deepest [ / { nesting in JSON text, counted without recursion (strings skipped). */
export function jsonNestingDepth(text: string): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c)
        i++; // backslash: skip the escaped character
      else if (c === 0x22) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x5b || c === 0x7b) deepest = Math.max(deepest, ++depth);
    else if (c === 0x5d || c === 0x7d) depth--;
  }
  return deepest;
}

function clampServings(n: number | null): number {
  if (n === null || !Number.isFinite(n) || n < 1) return 4;
  return Math.min(MAX_SERVINGS, Math.round(n));
}

/** "6 servings", "Serves 4-6", 8, ["4", "4 portions"] → a whole number of servings (a range takes its low end). */
export function servingsFrom(value: unknown): number | null {
  if (typeof value === 'number') return value;
  if (Array.isArray(value)) {
    for (const v of value) {
      const n = servingsFrom(v);
      if (n !== null) return n;
    }
    return null;
  }
  if (typeof value === 'string') {
    const m = value.match(/(\d+(?:\.\d+)?)/);
    return m ? Number(m[1]) : null;
  }
  return null;
}

function textOf(value: unknown): string {
  if (typeof value === 'string') return value;
  if (Array.isArray(value)) return value.map(textOf).filter(Boolean).join('\n');
  if (value && typeof value === 'object') {
    const o = value as Record<string, unknown>;
    if (o['@type'] === 'HowToSection') return textOf(o.itemListElement);
    return textOf(o.text ?? o.name ?? '');
  }
  return '';
}

function isRecipeNode(node: unknown): node is Record<string, unknown> {
  if (!node || typeof node !== 'object') return false;
  const type = (node as Record<string, unknown>)['@type'];
  return type === 'Recipe' || (Array.isArray(type) && type.includes('Recipe'));
}

/** Every Recipe of a document, in file order: the document itself, an array of them, or an `@graph`. */
function collectRecipeNodes(doc: unknown, into: Record<string, unknown>[]): void {
  if (isRecipeNode(doc)) {
    into.push(doc);
    return;
  }
  if (Array.isArray(doc)) for (const d of doc) collectRecipeNodes(d, into);
  else if (doc && typeof doc === 'object' && '@graph' in doc) collectRecipeNodes((doc as { '@graph': unknown })['@graph'], into);
}

/** At most this many recipes from one file (a whole-book export holds one per recipe). */
export const MAX_RECIPES_PER_FILE = 200;

function fromJsonLd(doc: unknown): ImportedRecipe[] {
  const nodes: Record<string, unknown>[] = [];
  collectRecipeNodes(doc, nodes);
  if (nodes.length === 0) throw badRequest('file: the JSON has no schema.org Recipe in it (no object with "@type": "Recipe").');
  if (nodes.length > MAX_RECIPES_PER_FILE) {
    throw badRequest(`file: the file holds ${nodes.length} recipes; import at most ${MAX_RECIPES_PER_FILE} at a time.`);
  }
  return nodes.map(recipeFromNode);
}

function recipeFromNode(node: Record<string, unknown>): ImportedRecipe {
  const ingredients = (Array.isArray(node.recipeIngredient) ? node.recipeIngredient : Array.isArray(node.ingredients) ? node.ingredients : [])
    .map((s) => String(s).trim())
    .filter(Boolean);
  if (ingredients.length === 0) throw badRequest('file: the Recipe has no recipeIngredient list.');
  return {
    title:
      String(node.name ?? 'Imported recipe')
        .trim()
        .slice(0, 200) || 'Imported recipe',
    servings: clampServings(servingsFrom(node.recipeYield)),
    ingredients,
    method: textOf(node.recipeInstructions).trim(),
    notes: typeof node.description === 'string' ? node.description.trim() : '',
    format: 'json-ld',
    ...(node['hearthswap:versions'] !== undefined ? { versions: exportedVersions(node['hearthswap:versions']) } : {}),
  };
}

/** Hearthswap's own version history in a file: checked whole, a failure naming the field in the file. */
function exportedVersions(value: unknown): ExportedVersion[] {
  const parsed = exportedVersionsSchema.safeParse(value);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const field = ['hearthswap:versions', ...issue.path].join('.');
    throw badRequest(`file: ${field}: ${issue.message}`, { fieldErrors: { [field]: [issue.message] } });
  }
  return parsed.data;
}

/** A plain-text or Markdown recipe: a title, an Ingredients section, an optional Method section. */
function fromText(text: string): ImportedRecipe {
  const read = readRecipeText(text, 'title-and-notes');
  if (read.ingredients.length === 0) {
    throw badRequest('file: no ingredient lines found. Put them under an "Ingredients" heading, or one per line starting with "-" or an amount.');
  }
  return {
    title: (read.title || 'Imported recipe').slice(0, 200),
    servings: clampServings(read.servings),
    ingredients: read.ingredients,
    method: read.method.join('\n'),
    notes: read.notes.join('\n'),
    format: 'text',
  };
}

/**
 * Decides the type by content, never by the file name: JSON with schema.org Recipes (every one of
 * them, so a whole-book export comes back whole), or one UTF-8 text recipe.
 */
export function parseRecipeFile(buffer: Buffer): ImportedRecipe[] {
  if (buffer.length === 0) throw badRequest('file: the file is empty.');
  if (buffer.includes(0)) throw badRequest('file: this is a binary file; upload a .txt or .md recipe or a schema.org Recipe .json/.jsonld file.');
  const text = new TextDecoder('utf-8', { fatal: false }).decode(buffer).replace(/^\uFEFF/, '');
  if (text.includes('\uFFFD')) throw badRequest('file: the file is not UTF-8 text; upload a .txt or .md recipe or a schema.org Recipe .json/.jsonld file.');
  const trimmed = text.trim();
  if (trimmed.startsWith('{') || trimmed.startsWith('[')) {
    if (jsonNestingDepth(trimmed) > MAX_JSON_DEPTH) {
      throw badRequest(`file: the JSON is nested more than ${MAX_JSON_DEPTH} levels deep; a recipe file is never that deep.`);
    }
    let doc: unknown;
    try {
      doc = JSON.parse(trimmed);
    } catch {
      throw badRequest('file: the file looks like JSON but does not parse.');
    }
    return fromJsonLd(doc);
  }
  return [fromText(text)];
}

/**
 * The title an import gets: its own, or with " (imported)" (then " (imported 2)", …) when the cook
 * already has a recipe of that name, so an import never reads as the recipe it came from.
 */
export function importedTitle(title: string, taken: ReadonlySet<string>): string {
  const has = (t: string) => taken.has(t.trim().toLowerCase());
  if (!has(title)) return title;
  for (let n = 1; ; n++) {
    const suffix = n === 1 ? ' (imported)' : ` (imported ${n})`;
    const candidate = `${title.slice(0, 200 - suffix.length)}${suffix}`;
    if (!has(candidate)) return candidate;
  }
}
