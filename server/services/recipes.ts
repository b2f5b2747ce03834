import { Op, type Sequelize, type Transaction } from 'sequelize';
import { Recipe, RecipeVersion, User } from '../models';
import { divideNutrients, nutrientsForGrams, sumNutrients, zeroNutrients } from '../../shared/nutrition';
import { isIncompleteLine, NO_FOOD_WARNING, ZERO_GRAMS_WARNING } from '../../shared/line-status';
import type { RecipeDetail, RecipeSummary, StoredLine, VersionDetail, VersionKind, VersionLineInput, VersionSummary } from '../../shared/schemas/recipes';
import type { TargetsInput } from '../../shared/schemas/rewrite';
import type { LineInput } from '../../shared/schemas/analyze';
import { analyzeLine, lineVolumeMl, textToLines, type FoodVisibility } from './analysis';
import { canSeeFood, ownFoodsFor } from './custom-foods';
import type { CatalogueFood } from '../../shared/food';
import type { StoredFood } from './catalogue';
import type { FoodEngine } from './food-engine';
import { HttpError, badRequest, conflict, notFound } from '../lib/http-error';
import type { ExportedLine, ExportedVersion } from '../../shared/schemas/recipe-jsonld';

function formatGramsForText(grams: number) {
  return grams >= 10 ? String(Math.round(grams)) : String(Math.round(grams * 10) / 10);
}

/** Turns lines as typed or as a rewrite returns them into stored lines, each weighed and matched. */
export function normaliseLines(
  engine: FoodEngine,
  lines: VersionLineInput[],
  canUse: FoodVisibility = (f) => f.source === 'usda-sr28',
  ownFoods: readonly CatalogueFood[] = [],
): StoredLine[] {
  return lines.map((line, i) => {
    if ('food' in line) {
      const found = engine.byId.get(line.food.id);
      const food = found && canUse(found) ? found : undefined;
      if (!food)
        throw badRequest(`lines.${i}.food.id: no food ${line.food.id} in the catalogue.`, { fieldErrors: { [`lines.${i}.food.id`]: ['Unknown food.'] } });
      return { input: line.input ?? `${formatGramsForText(line.grams)} g ${food.name}`, foodId: food.id, foodName: food.name, grams: line.grams };
    }
    const typed: LineInput = { input: line.input };
    if (line.foodId != null) typed.foodId = line.foodId;
    if (line.grams !== undefined) typed.grams = line.grams;
    const analysed = analyzeLine(engine, typed, canUse, ownFoods);
    const stored: StoredLine = {
      input: line.input,
      foodId: analysed.matchedFood?.id ?? null,
      foodName: analysed.matchedFood?.name ?? null,
      grams: analysed.grams,
    };
    if (analysed.warnings.length > 0) stored.warnings = analysed.warnings;
    if (analysed.checkMatch) stored.checkMatch = true;
    return stored;
  });
}

export function computeVersion(engine: FoodEngine, lines: StoredLine[], servings: number) {
  const detailed = lines.map((line) => {
    const food = line.foodId != null ? engine.byId.get(line.foodId) : undefined;
    const incomplete = isIncompleteLine({ grams: line.grams, food: food ?? null });
    const warnings = [...(line.warnings ?? [])];
    // Saved before lines kept their warnings, or weighed 0 g: the version still says so.
    if (incomplete && warnings.length === 0) warnings.push(food ? ZERO_GRAMS_WARNING : NO_FOOD_WARNING);
    return {
      ...line,
      nutrients: food ? nutrientsForGrams(food.per100g, line.grams) : zeroNutrients(),
      volumeMl: lineVolumeMl(engine, line.input, food ?? null, line.grams),
      incomplete,
      warnings,
    };
  });
  const totals = sumNutrients(detailed.map((l) => l.nutrients));
  return { lines: detailed, totals, perServing: divideNutrients(totals, servings), volumeMl: detailed.reduce((s, l) => s + l.volumeMl, 0) };
}

function versionSummary(v: RecipeVersion): VersionSummary {
  return {
    number: v.number,
    kind: v.kind,
    parentNumber: v.parentNumber,
    servings: v.servings,
    perServing: v.perServing,
    note: v.note,
    createdAt: v.createdAt.toISOString(),
  };
}

export function versionDetail(engine: FoodEngine, v: RecipeVersion): VersionDetail {
  const computed = computeVersion(engine, v.lines, v.servings);
  return { ...versionSummary(v), lines: computed.lines, targets: v.targets, totals: v.totals, volumeMl: computed.volumeMl };
}

async function summaries(recipes: Recipe[]): Promise<Map<number, { count: number; latest: RecipeVersion | null }>> {
  const out = new Map<number, { count: number; latest: RecipeVersion | null }>();
  if (recipes.length === 0) return out;
  const versions = await RecipeVersion.findAll({ where: { recipeId: recipes.map((r) => r.id) }, order: [['number', 'ASC']] });
  for (const v of versions) {
    const entry = out.get(v.recipeId) ?? { count: 0, latest: null };
    entry.count++;
    entry.latest = v;
    out.set(v.recipeId, entry);
  }
  return out;
}

function recipeSummary(r: Recipe, info: { count: number; latest: RecipeVersion | null } | undefined): RecipeSummary {
  return {
    id: r.id,
    title: r.title,
    servings: r.servings,
    revision: r.revision,
    versionCount: info?.count ?? 0,
    latest: info?.latest ? versionSummary(info.latest) : null,
    hasPhoto: r.photoKey !== null,
    thumbnailUrl: r.photoKey ? `/api/recipes/${r.id}/photo?size=thumb&v=${encodeURIComponent(r.photoKey)}` : null,
    updatedAt: r.updatedAt.toISOString(),
    createdAt: r.createdAt.toISOString(),
  };
}

/** Who may read a recipe: its owner, or the owner's coach. Everyone else gets a 404. */
export async function findReadableRecipe(viewer: User, id: number): Promise<Recipe> {
  const recipe = await Recipe.findOne({ where: { id, deletedAt: null } });
  if (!recipe) throw notFound('No recipe with that id.');
  if (recipe.ownerId === viewer.id) return recipe;
  if (viewer.role === 'coach') {
    const owner = await User.findByPk(recipe.ownerId);
    if (owner?.coachId === viewer.id) return recipe;
  }
  throw notFound('No recipe with that id.');
}

async function findOwnRecipe(viewer: User, id: number, transaction?: Transaction, includeDeleted = false): Promise<Recipe> {
  const recipe = await Recipe.findOne({
    where: { id, ownerId: viewer.id, ...(includeDeleted ? {} : { deletedAt: null }) },
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!recipe) throw notFound('No recipe with that id.');
  return recipe;
}

export async function listRecipes(viewer: User, query: { q?: string; sort: 'updated' | 'title' | 'kcal' | 'protein' }) {
  const where: Record<string | symbol, unknown> = { ownerId: viewer.id, deletedAt: null };
  if (query.q?.trim()) where.title = { [Op.iLike]: `%${query.q.trim().replace(/[\\%_]/g, (c) => `\\${c}`)}%` };
  const recipes = await Recipe.findAll({ where, order: [['updatedAt', 'DESC']] });
  const info = await summaries(recipes);
  const list = recipes.map((r) => recipeSummary(r, info.get(r.id)));
  if (query.sort === 'title') list.sort((a, b) => a.title.localeCompare(b.title));
  if (query.sort === 'kcal') list.sort((a, b) => (a.latest?.perServing.kcal ?? 0) - (b.latest?.perServing.kcal ?? 0));
  if (query.sort === 'protein') list.sort((a, b) => (b.latest?.perServing.proteinG ?? 0) - (a.latest?.perServing.proteinG ?? 0));
  return list;
}

export async function recipeDetail(recipe: Recipe): Promise<RecipeDetail> {
  const versions = await RecipeVersion.findAll({ where: { recipeId: recipe.id }, order: [['number', 'ASC']] });
  const summary = recipeSummary(recipe, { count: versions.length, latest: versions.at(-1) ?? null });
  return {
    ...summary,
    notes: recipe.notes,
    method: recipe.method,
    photoUrl: recipe.photoKey ? `/api/recipes/${recipe.id}/photo?v=${encodeURIComponent(recipe.photoKey)}` : null,
    versions: versions.map(versionSummary),
  };
}

interface NewVersion {
  kind: VersionKind;
  lines: StoredLine[];
  servings: number;
  targets?: TargetsInput | null;
  note?: string;
  parentNumber?: number | null;
}

async function insertVersion(engine: FoodEngine, recipe: Recipe, input: NewVersion, createdBy: number, transaction: Transaction) {
  const last = (await RecipeVersion.max('number', { where: { recipeId: recipe.id }, transaction })) as number | null;
  if (input.parentNumber != null) {
    const parent = await RecipeVersion.findOne({ where: { recipeId: recipe.id, number: input.parentNumber }, transaction });
    if (!parent) throw badRequest(`parentNumber: version ${input.parentNumber} does not exist.`, { fieldErrors: { parentNumber: ['Unknown version.'] } });
  }
  const computed = computeVersion(engine, input.lines, input.servings);
  const version = await RecipeVersion.create(
    {
      recipeId: recipe.id,
      number: (last ?? 0) + 1,
      kind: input.kind,
      parentNumber: input.parentNumber ?? last ?? null,
      servings: input.servings,
      lines: input.lines,
      targets: input.targets ?? null,
      totals: computed.totals,
      perServing: computed.perServing,
      volumeMl: computed.volumeMl,
      note: input.note ?? '',
      createdBy,
    },
    { transaction },
  );
  recipe.changed('updatedAt', true);
  await recipe.save({ transaction });
  return version;
}

export async function createRecipe(
  sequelize: Sequelize,
  engine: FoodEngine,
  viewer: User,
  input: { title: string; servings: number; notes?: string; method?: string; text?: string; lines?: VersionLineInput[] },
) {
  const lineInputs: VersionLineInput[] = input.lines ?? textToLines(input.text ?? '');
  if (lineInputs.length === 0) throw badRequest('text: the recipe has no ingredient lines.', { fieldErrors: { text: ['No ingredient lines.'] } });
  const lines = normaliseLines(engine, lineInputs, (f) => canSeeFood(f as StoredFood, viewer), ownFoodsFor(engine, viewer));
  return sequelize.transaction(async (transaction) => {
    const recipe = await Recipe.create(
      { ownerId: viewer.id, title: input.title, servings: input.servings, notes: input.notes ?? '', method: input.method ?? '' },
      { transaction },
    );
    await insertVersion(engine, recipe, { kind: 'original', lines, servings: input.servings, note: 'As written' }, viewer.id, transaction);
    return recipe;
  });
}

function checkRevision(recipe: Recipe, revision: number) {
  if (recipe.revision !== revision) {
    throw conflict(
      `This recipe changed since you opened it (you sent revision ${revision}, it is now ${recipe.revision}). Reload to see the latest; nothing was changed.`,
      {
        currentRevision: recipe.revision,
      },
    );
  }
}

export async function updateRecipe(
  sequelize: Sequelize,
  viewer: User,
  id: number,
  input: { revision: number; title?: string; servings?: number; notes?: string; method?: string },
) {
  return sequelize.transaction(async (transaction) => {
    const recipe = await findOwnRecipe(viewer, id, transaction);
    checkRevision(recipe, input.revision);
    if (input.title !== undefined) recipe.title = input.title;
    if (input.servings !== undefined) recipe.servings = input.servings;
    if (input.notes !== undefined) recipe.notes = input.notes;
    if (input.method !== undefined) recipe.method = input.method;
    recipe.revision += 1;
    await recipe.save({ transaction });
    return recipe;
  });
}

/**
 * Points the recipe at a newly stored photo (or at none). The row is locked and the revision bumped in one
 * transaction, so a concurrent edit and a photo can never be acknowledged as the same revision;
 * a stale `revision` (when the client sends one) is a 409. Returns the photo key it replaced.
 */
export async function setRecipePhoto(
  sequelize: Sequelize,
  viewer: User,
  id: number,
  revision: number | undefined,
  photo: { key: string; type: string } | null,
): Promise<{ recipe: Recipe; previousKey: string | null }> {
  return sequelize.transaction(async (transaction) => {
    const recipe = await findOwnRecipe(viewer, id, transaction);
    if (revision !== undefined) checkRevision(recipe, revision);
    const previousKey = recipe.photoKey;
    recipe.photoKey = photo?.key ?? null;
    recipe.photoType = photo?.type ?? null;
    recipe.revision += 1;
    await recipe.save({ transaction });
    return { recipe, previousKey };
  });
}

export async function deleteRecipe(sequelize: Sequelize, viewer: User, id: number, revision: number) {
  return sequelize.transaction(async (transaction) => {
    const recipe = await findOwnRecipe(viewer, id, transaction);
    checkRevision(recipe, revision);
    recipe.deletedAt = new Date();
    recipe.revision += 1;
    await recipe.save({ transaction });
    return recipe;
  });
}

/** Undo of a delete: the recipe and every version come back as they were. */
export async function undeleteRecipe(sequelize: Sequelize, viewer: User, id: number) {
  return sequelize.transaction(async (transaction) => {
    const recipe = await findOwnRecipe(viewer, id, transaction, true);
    if (recipe.deletedAt === null) return recipe;
    recipe.deletedAt = null;
    recipe.revision += 1;
    await recipe.save({ transaction });
    return recipe;
  });
}

export async function listVersions(recipe: Recipe) {
  const versions = await RecipeVersion.findAll({ where: { recipeId: recipe.id }, order: [['number', 'ASC']] });
  return versions.map(versionSummary);
}

export async function getVersion(recipe: Recipe, number: number) {
  const version = await RecipeVersion.findOne({ where: { recipeId: recipe.id, number } });
  if (!version) throw notFound(`This recipe has no version ${number}.`);
  return version;
}

export async function addVersion(
  sequelize: Sequelize,
  engine: FoodEngine,
  viewer: User,
  id: number,
  input: { kind: VersionKind; lines: VersionLineInput[]; servings?: number; targets?: TargetsInput | null; note?: string; parentNumber?: number },
) {
  const lines = normaliseLines(engine, input.lines, (f) => canSeeFood(f as StoredFood, viewer), ownFoodsFor(engine, viewer));
  return sequelize.transaction(async (transaction) => {
    const recipe = await findOwnRecipe(viewer, id, transaction);
    return insertVersion(engine, recipe, { ...input, lines, servings: input.servings ?? recipe.servings }, viewer.id, transaction);
  });
}

/** Restoring copies an old version forward as the newest one; nothing in between is lost. */
export async function restoreVersion(sequelize: Sequelize, engine: FoodEngine, viewer: User, id: number, number: number) {
  return sequelize.transaction(async (transaction) => {
    const recipe = await findOwnRecipe(viewer, id, transaction);
    const source = await RecipeVersion.findOne({ where: { recipeId: recipe.id, number }, transaction });
    if (!source) throw notFound(`This recipe has no version ${number}.`);
    return insertVersion(
      engine,
      recipe,
      { kind: 'edit', lines: source.lines, servings: source.servings, targets: source.targets, note: `Restored from version ${number}`, parentNumber: number },
      viewer.id,
      transaction,
    );
  });
}

export async function duplicateRecipe(sequelize: Sequelize, engine: FoodEngine, viewer: User, id: number) {
  const source = await findReadableRecipe(viewer, id);
  const versions = await RecipeVersion.findAll({ where: { recipeId: source.id }, order: [['number', 'ASC']] });
  const latest = versions.at(-1);
  if (!latest) throw new HttpError(409, 'conflict', 'This recipe has no version to copy.');
  return sequelize.transaction(async (transaction) => {
    const copy = await Recipe.create(
      { ownerId: viewer.id, title: `${source.title} (copy)`.slice(0, 200), servings: latest.servings, notes: source.notes, method: source.method },
      { transaction },
    );
    await insertVersion(
      engine,
      copy,
      {
        kind: 'original',
        lines: latest.lines,
        servings: latest.servings,
        targets: latest.targets,
        note: `Copied from “${source.title}” version ${latest.number}`,
      },
      viewer.id,
      transaction,
    );
    return copy;
  });
}

/** The cook's recipe titles, trimmed and lower-cased, for naming an import that repeats one. */
export async function ownRecipeTitles(viewer: User): Promise<Set<string>> {
  const own = await Recipe.findAll({ where: { ownerId: viewer.id, deletedAt: null }, attributes: ['title'] });
  return new Set(own.map((r) => r.title.trim().toLowerCase()));
}

/** Every version of a recipe, oldest first, as stored. */
export async function versionRows(recipe: Recipe) {
  return RecipeVersion.findAll({ where: { recipeId: recipe.id }, order: [['number', 'ASC']] });
}

/** The account's recipes (not deleted), each with every version, for the whole-book export. */
export async function ownRecipesWithVersions(viewer: User) {
  const recipes = await Recipe.findAll({ where: { ownerId: viewer.id, deletedAt: null }, order: [['createdAt', 'ASC']] });
  const versions = recipes.length ? await RecipeVersion.findAll({ where: { recipeId: recipes.map((r) => r.id) }, order: [['number', 'ASC']] }) : [];
  return recipes.map((recipe) => ({ recipe, versions: versions.filter((v) => v.recipeId === recipe.id) }));
}

/**
 * The food a line of an exported version names, as this viewer can use it: an SR28 food by its NDB
 * number; a label food by its own id when the viewer can use it (hidden ones too), else by name.
 */
function importedFood(engine: FoodEngine, viewer: User, line: ExportedLine, sr28: Map<string, CatalogueFood>): CatalogueFood | null {
  const ref = line['hearthswap:food'];
  if (!ref) return null;
  if (ref['hearthswap:source'] === 'usda-sr28') return sr28.get(ref['hearthswap:sourceId']) ?? null;
  for (const food of engine.custom.values()) {
    if (food.sourceId === ref['hearthswap:sourceId'] && (food.ownerId === viewer.id || canSeeFood(food, viewer))) return food;
  }
  const wanted = ref.name.trim().toLowerCase();
  return ownFoodsFor(engine, viewer).find((f) => f.name.trim().toLowerCase() === wanted) ?? null;
}

/** Lines of an exported version as stored lines: the same text, food and grams; an unknown food is matched by the text, keeping the grams. */
function importedLines(engine: FoodEngine, viewer: User, version: ExportedVersion, sr28: Map<string, CatalogueFood>): StoredLine[] {
  return version['hearthswap:lines'].map((line) => {
    const food = importedFood(engine, viewer, line, sr28);
    const ref = line['hearthswap:food'];
    if (ref && !food) {
      const [matched] = normaliseLines(
        engine,
        [{ input: line['hearthswap:text'], grams: line['hearthswap:grams'] }],
        (f) => canSeeFood(f as StoredFood, viewer),
        ownFoodsFor(engine, viewer),
      );
      return {
        ...matched,
        warnings: [...(matched.warnings ?? []), `The file's food “${ref.name}” is not one you can use here; matched the line's text instead.`],
      };
    }
    const stored: StoredLine = { input: line['hearthswap:text'], foodId: food?.id ?? null, foodName: food?.name ?? null, grams: line['hearthswap:grams'] };
    if (line['hearthswap:warnings']?.length) stored.warnings = line['hearthswap:warnings'];
    if (line['hearthswap:checkMatch']) stored.checkMatch = true;
    return stored;
  });
}

/** A recipe from Hearthswap's own export: every version in order, with its kind, note, targets, foods and grams. */
export async function importRecipeWithVersions(
  sequelize: Sequelize,
  engine: FoodEngine,
  viewer: User,
  input: { title: string; servings: number; notes: string; method: string },
  versions: ExportedVersion[],
) {
  const sr28 = new Map<string, CatalogueFood>();
  for (const food of engine.byId.values()) if (food.source === 'usda-sr28') sr28.set(food.sourceId, food);
  const ordered = [...versions].sort((a, b) => a['hearthswap:number'] - b['hearthswap:number']);
  const prepared = ordered.map((v) => ({ version: v, lines: importedLines(engine, viewer, v, sr28) }));
  return sequelize.transaction(async (transaction) => {
    const recipe = await Recipe.create(
      { ownerId: viewer.id, title: input.title, servings: input.servings, notes: input.notes, method: input.method },
      { transaction },
    );
    const numbers = new Map<number, number>();
    for (const { version, lines } of prepared) {
      const parent = version['hearthswap:parentNumber'];
      const saved = await insertVersion(
        engine,
        recipe,
        {
          kind: version['hearthswap:kind'],
          lines,
          servings: version['hearthswap:servings'],
          targets: version['hearthswap:targets'],
          note: version['hearthswap:note'],
          parentNumber: parent != null ? (numbers.get(parent) ?? null) : null,
        },
        viewer.id,
        transaction,
      );
      numbers.set(version['hearthswap:number'], saved.number);
    }
    return recipe;
  });
}
