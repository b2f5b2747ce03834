export { VERSION_KIND_LABELS, versionKindLabel, versionNote, versionTitle } from '../../lib/version-kinds';

/**
 * The line as the cook wrote it, or null when the server wrote it from the grams and the food
 * ("400 g Pasta, whole-wheat, dry") and it would only repeat them.
 */
export function writtenLine(line: { input: string; foodName: string | null }): string | null {
  const input = line.input.trim();
  if (!input) return null;
  if (line.foodName && /^\d+(?:\.\d+)? g /.test(input) && input.endsWith(line.foodName)) return null;
  return input;
}
