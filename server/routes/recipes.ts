import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import type { AppConfig } from '../config';
import {
  createRecipeSchema,
  createVersionSchema,
  deleteRecipeSchema,
  exportQuerySchema,
  idParam,
  recipeListQuerySchema,
  updateRecipeSchema,
  photoUploadFieldsSchema,
  photoQuerySchema,
  versionParam,
} from '../../shared/schemas/recipes';
import { MAX_LINES } from '../../shared/schemas/analyze';
import { parse } from '../middleware/validate';
import { requireAuth } from '../middleware/auth';
import { getFoodEngine } from '../services/food-engine';
import {
  addVersion,
  createRecipe,
  deleteRecipe,
  duplicateRecipe,
  findReadableRecipe,
  getVersion,
  listRecipes,
  importRecipeWithVersions,
  listVersions,
  ownRecipeTitles,
  ownRecipesWithVersions,
  recipeDetail,
  restoreVersion,
  undeleteRecipe,
  updateRecipe,
  versionDetail,
  versionRows,
} from '../services/recipes';
import { importedTitle, parseRecipeFile, type ImportedRecipe } from '../services/recipe-import';
import { assertSafeText } from '../middleware/text-safety';
import type { RateLimits } from '../middleware/rate-limits';
import { recipesToJsonLd, toJsonLd } from '../services/recipe-export';
import { MAX_PHOTO_BYTES } from '../services/photo-storage';
import { readRecipePhoto, removeRecipePhoto, replaceRecipePhoto } from '../services/recipe-photo';
import { HttpError, badRequest } from '../lib/http-error';
import { singleFile } from '../middleware/upload';

const MAX_IMPORT_BYTES = 1024 * 1024;

/** An imported file passes the same schema and limits as a typed recipe; failures name the field in the file. */
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

export function recipesRouter(sequelize: Sequelize, config: AppConfig, limits: RateLimits) {
  const router = Router();
  router.use(requireAuth);
  const engine = () => getFoodEngine(sequelize);

  router.get('/', async (req, res) => {
    const query = parse(recipeListQuerySchema, req.query);
    res.json({ recipes: await listRecipes(req.user!, query) });
  });

  router.post('/', async (req, res) => {
    const input = parse(createRecipeSchema, req.body);
    const recipe = await createRecipe(sequelize, await engine(), req.user!, input);
    res.status(201).json(await recipeDetail(recipe));
  });

  router.post('/import', limits.recipeImports, singleFile(MAX_IMPORT_BYTES, 'recipe file'), async (req, res) => {
    if (!req.file) throw badRequest('file: attach the recipe in the form field "file".', { fieldErrors: { file: ['Required.'] } });
    const files = parseRecipeFile(req.file.buffer);
    // Every recipe is checked before any is saved, so a bad one in a book saves nothing.
    const prepared = files.map((imported) => {
      if (imported.versions) assertSafeText(imported.versions, 'file');
      return { imported, input: importedRecipeInput(imported) };
    });
    const taken = new Set(await ownRecipeTitles(req.user!));
    const saved = [];
    for (const { imported, input } of prepared) {
      const title = importedTitle(imported.title, taken);
      taken.add(title.trim().toLowerCase());
      saved.push(
        imported.versions
          ? await importRecipeWithVersions(
              sequelize,
              await engine(),
              req.user!,
              { title, servings: input.servings, notes: input.notes ?? '', method: input.method ?? '' },
              imported.versions,
            )
          : await createRecipe(sequelize, await engine(), req.user!, { ...input, title }),
      );
    }
    res.status(201).json({
      ...(await recipeDetail(saved[0])),
      importedFrom: files[0].format,
      importedCount: saved.length,
      alsoImported: saved.slice(1).map((r) => ({ id: r.id, title: r.title })),
    });
  });

  // every recipe with every version, for keeping (and before deleting an account)
  router.get('/export.jsonld', async (req, res) => {
    const foods = await engine();
    const doc = recipesToJsonLd(await ownRecipesWithVersions(req.user!), (id) => foods.byId.get(id));
    res.type('application/ld+json');
    res.setHeader('Content-Disposition', 'attachment; filename="hearthswap-recipes.jsonld"');
    res.send(JSON.stringify(doc, null, 2));
  });

  router.get('/:id', async (req, res) => {
    const { id } = parse(idParam, req.params);
    res.json(await recipeDetail(await findReadableRecipe(req.user!, id)));
  });

  router.patch('/:id', async (req, res) => {
    const { id } = parse(idParam, req.params);
    const input = parse(updateRecipeSchema, req.body);
    res.json(await recipeDetail(await updateRecipe(sequelize, req.user!, id, input)));
  });

  router.delete('/:id', async (req, res) => {
    const { id } = parse(idParam, req.params);
    const { revision } = parse(deleteRecipeSchema, { ...req.query, ...(req.body ?? {}) });
    const recipe = await deleteRecipe(sequelize, req.user!, id, revision);
    res.json({ id: recipe.id, deleted: true, revision: recipe.revision });
  });

  router.post('/:id/undelete', async (req, res) => {
    const { id } = parse(idParam, req.params);
    res.json(await recipeDetail(await undeleteRecipe(sequelize, req.user!, id)));
  });

  router.post('/:id/duplicate', async (req, res) => {
    const { id } = parse(idParam, req.params);
    res.status(201).json(await recipeDetail(await duplicateRecipe(sequelize, await engine(), req.user!, id)));
  });

  router.get('/:id/versions', async (req, res) => {
    const { id } = parse(idParam, req.params);
    res.json({ versions: await listVersions(await findReadableRecipe(req.user!, id)) });
  });

  router.post('/:id/versions', async (req, res) => {
    const { id } = parse(idParam, req.params);
    const input = parse(createVersionSchema, req.body);
    const version = await addVersion(sequelize, await engine(), req.user!, id, input);
    res.status(201).json(versionDetail(await engine(), version));
  });

  router.get('/:id/versions/:number', async (req, res) => {
    const { id, number } = parse(versionParam, req.params);
    const recipe = await findReadableRecipe(req.user!, id);
    res.json(versionDetail(await engine(), await getVersion(recipe, number)));
  });

  router.post('/:id/restore/:number', async (req, res) => {
    const { id, number } = parse(versionParam, req.params);
    const version = await restoreVersion(sequelize, await engine(), req.user!, id, number);
    res.status(201).json(versionDetail(await engine(), version));
  });

  router.get('/:id/export.jsonld', async (req, res) => {
    const { id } = parse(idParam, req.params);
    const recipe = await findReadableRecipe(req.user!, id);
    const versions = await versionRows(recipe);
    const number = parse(exportQuerySchema, req.query).version ?? versions.at(-1)?.number;
    if (!number) throw badRequest('version: this recipe has no version yet.');
    const version = await getVersion(recipe, number);
    const foods = await engine();
    const slug =
      recipe.title
        .toLowerCase()
        .replace(/[^a-z0-9]+/g, '-')
        .replace(/^-|-$/g, '') || 'recipe';
    res.type('application/ld+json');
    res.setHeader('Content-Disposition', `attachment; filename="${slug}-v${version.number}.jsonld"`);
    res.send(
      JSON.stringify(
        toJsonLd(recipe, version, versions, (foodId) => foods.byId.get(foodId)),
        null,
        2,
      ),
    );
  });

  router.post('/:id/photo', singleFile(MAX_PHOTO_BYTES, 'photo'), async (req, res) => {
    const { id } = parse(idParam, req.params);
    const { revision } = parse(photoUploadFieldsSchema, req.body);
    const recipe = await replaceRecipePhoto(sequelize, config.s3, req.user!, id, revision, req.file?.buffer);
    res.status(201).json(await recipeDetail(recipe));
  });

  router.delete('/:id/photo', async (req, res) => {
    const { id } = parse(idParam, req.params);
    const { revision } = parse(photoUploadFieldsSchema, { ...req.query, ...(req.body ?? {}) });
    res.json(await recipeDetail(await removeRecipePhoto(sequelize, config.s3, req.user!, id, revision)));
  });

  router.get('/:id/photo', async (req, res) => {
    const { id } = parse(idParam, req.params);
    const { size } = parse(photoQuerySchema, req.query);
    const photo = await readRecipePhoto(config.s3, req.user!, id, size);
    res.type(photo.type);
    res.setHeader('Cache-Control', 'private, max-age=86400');
    res.send(photo.image);
  });

  return router;
}
