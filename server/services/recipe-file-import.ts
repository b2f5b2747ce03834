/**
 * A recipe file brought into the book: every recipe it holds (a whole-book export comes back whole),
 * each passing the same schema and limits as a typed recipe, all checked before any is saved.
 */
import type { Sequelize } from 'sequelize';
import { MAX_LINES } from '../../shared/schemas/analyze';
import { createRecipeSchema } from '../../shared/schemas/recipes';
import { HttpError } from '../lib/http-error';
import { assertSafeText } from '../middleware/text-safety';
import { parse } from '../middleware/validate';
import type { FoodEngine } from './food-engine';
import { importedTitle, parseRecipeFile, type ImportedRecipe } from './recipe-import';
import { createRecipe, importRecipeWithVersions, ownRecipeTitles } from './recipes';
import type { User } from './users';

/** Failures name the field in the file. */
function importedRecipeInput(imported: ImportedRecipe) {
  const input = {
    title: imported.title,
    servings: imported.servings,
    notes: imported.notes,
    method: imported.method,
    // One line past the limit is enough for the schema to refuse; no need to build 100,000 objects.
    lines: imported.ingredients.slice(0, MAX_LINES + 1).map((line) => ({ input: line })),
  };
  try {
    assertSafeText(input);
    return parse(createRecipeSchema, input);
  } catch (error) {
    if (error instanceof HttpError)
      throw new HttpError(400, error.code, `file: the recipe in this file cannot be saved as it is — ${error.message}`, error.details);
    throw error;
  }
}

export async function importRecipeFile(sequelize: Sequelize, engine: FoodEngine, viewer: User, buffer: Buffer) {
  const files = parseRecipeFile(buffer);
  const prepared = files.map((imported) => {
    if (imported.versions) assertSafeText(imported.versions, 'file');
    return { imported, input: importedRecipeInput(imported) };
  });
  // an import never reads as the recipe it came from, nor as another recipe of the same file
  const taken = new Set(await ownRecipeTitles(viewer));
  const saved = [];
  for (const { imported, input } of prepared) {
    const title = importedTitle(imported.title, taken);
    taken.add(title.trim().toLowerCase());
    saved.push(
      imported.versions
        ? await importRecipeWithVersions(
            sequelize,
            engine,
            viewer,
            { title, servings: input.servings, notes: input.notes ?? '', method: input.method ?? '' },
            imported.versions,
          )
        : await createRecipe(sequelize, engine, viewer, { ...input, title }),
    );
  }
  return { saved, format: files[0].format };
}
