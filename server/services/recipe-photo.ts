import type { Sequelize } from 'sequelize';
import type { S3Config } from '../config';
import { HttpError, badRequest } from '../lib/http-error';
import { Recipe, type User } from '../models';
import { processPhoto, readPhoto, removePhoto, storePhoto, thumbnailFrom, thumbnailKey } from './photo-storage';
import { findReadableRecipe, setRecipePhoto } from './recipes';

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
  const photo = await processPhoto(upload);
  const stored = await storePhoto(s3, owned.id, photo);
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

/** Takes the photo off the owner's recipe (revision checked when sent, bumped either way) and removes the stored files. */
export async function removeRecipePhoto(
  sequelize: Sequelize,
  s3: S3Config | null,
  owner: User,
  recipeId: number,
  revision: number | undefined,
): Promise<Recipe> {
  const saved = await setRecipePhoto(sequelize, owner, recipeId, revision, null);
  if (saved.previousKey) await removePhoto(s3, saved.previousKey);
  return saved.recipe;
}

/** The photo of a recipe the viewer may read, full size or as the list's thumbnail (made from the photo when it predates thumbnails). */
export async function readRecipePhoto(s3: S3Config | null, viewer: User, recipeId: number, size: 'full' | 'thumb'): Promise<{ image: Buffer; type: string }> {
  const recipe = await findReadableRecipe(viewer, recipeId);
  if (!recipe.photoKey) throw new HttpError(404, 'not_found', 'This recipe has no photo.');
  if (size === 'full') return { image: await readPhoto(s3, recipe.photoKey), type: recipe.photoType ?? 'image/webp' };
  const thumb = await readPhoto(s3, thumbnailKey(recipe.photoKey)).catch(async (error: unknown) => {
    if ((error as { name?: string }).name !== 'NoSuchKey') throw error;
    return thumbnailFrom(await readPhoto(s3, recipe.photoKey!));
  });
  return { image: thumb, type: 'image/webp' };
}
