import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { removePhoto, uploadPhoto } from '../../../lib/api/recipes';
import { storeRecipe } from './recipe-cache';

export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;

/** Why a photo can't be sent, or null when it may go. */
export function photoFileProblem(file: File): string | null {
  if (!(PHOTO_TYPES as readonly string[]).includes(file.type)) return 'This file is not a photo Hearthswap can read. Choose a JPEG, PNG or WebP picture.';
  if (file.size > PHOTO_MAX_BYTES) return 'This photo is too large: the limit is 5 MB. A phone photo at its usual size fits.';
  return null;
}

/** Uploads a recipe's photo; `progress` runs 0..1 while it goes out, null when nothing is uploading. */
export function useUploadPhoto(recipeId: number, revision: number) {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState<number | null>(null);
  const controller = useRef<AbortController | null>(null);
  const mutation = useMutation({
    mutationFn: (file: File) => {
      controller.current = new AbortController();
      setProgress(0);
      return uploadPhoto(recipeId, revision, file, setProgress, controller.current.signal);
    },
    onSuccess: (recipe) => storeRecipe(queryClient, recipe),
    onSettled: () => {
      setProgress(null);
      controller.current = null;
    },
  });
  return { ...mutation, progress, cancel: () => controller.current?.abort() };
}

export function useRemovePhoto(recipeId: number, revision: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => removePhoto(recipeId, revision),
    onSuccess: (recipe) => storeRecipe(queryClient, recipe),
  });
}
