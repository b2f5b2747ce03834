/** The Kitchen's paste form without its checks (recipe-input-schema.ts, loaded on submit): limits and the lines it reads. */
export const RECIPE_TEXT_MAX_LENGTH = 10_000;
export const SERVINGS_MAX = 50;

/** The non-blank lines of pasted text, trimmed: what the server will read one by one. */
export function ingredientLines(text: string): string[] {
  return text
    .split(/\r?\n/)
    .map((line) => line.trim())
    .filter((line) => line.length > 0);
}
