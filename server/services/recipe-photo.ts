import type { S3Config } from '../config';
import { HttpError } from '../lib/http-error';
import { Recipe, type User } from '../models';
import { processPhoto, removePhoto, storePhoto } from './photo-storage';

/** Resize and store a new photo for the owner's recipe, then drop the one it replaces. */
export async function replaceRecipePhoto(s3: S3Config | null, owner: User, recipeId: number, upload: Buffer): Promise<Recipe> {
  const recipe = await Recipe.findOne({ where: { id: recipeId, ownerId: owner.id, deletedAt: null } });
  if (!recipe) throw new HttpError(404, 'not_found', 'No recipe with that id.');
  const image = await processPhoto(upload);
  const stored = await storePhoto(s3, recipe.id, image);
  const previous = recipe.photoKey;
  recipe.photoKey = stored.key;
  recipe.photoType = stored.type;
  recipe.revision += 1;
  await recipe.save();
  if (previous) await removePhoto(s3, previous);
  return recipe;
}
