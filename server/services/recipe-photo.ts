import type { Sequelize } from 'sequelize';
import type { S3Config } from '../config';
import { HttpError, badRequest } from '../lib/http-error';
import { Recipe, type User } from '../models';
import { processPhoto, removePhoto, storePhoto } from './photo-storage';
import { setRecipePhoto } from './recipes';

/**
 * Resize and store a new photo for the owner's recipe, then drop the one it replaces. A stale
 * `revision` (when sent) is a 409 and the stored upload is removed again.
 */
export async function replaceRecipePhoto(
  sequelize: Sequelize,
  s3: S3Config | null,
  owner: User,
  recipeId: number,
  revision: number | undefined,
  upload: Buffer | undefined,
): Promise<Recipe> {
  const owned = await Recipe.findOne({ where: { id: recipeId, ownerId: owner.id, deletedAt: null } });
  if (!owned) throw new HttpError(404, 'not_found', 'No recipe with that id.');
  if (!upload) throw badRequest('file: attach the photo in the form field "file".', { fieldErrors: { file: ['Required.'] } });
  const image = await processPhoto(upload);
  const stored = await storePhoto(s3, owned.id, image);
  let saved: Awaited<ReturnType<typeof setRecipePhoto>>;
  try {
    saved = await setRecipePhoto(sequelize, owner, recipeId, revision, stored);
  } catch (error) {
    await removePhoto(s3, stored.key);
    throw error;
  }
  if (saved.previousKey) await removePhoto(s3, saved.previousKey);
  return saved.recipe;
}
