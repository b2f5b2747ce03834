import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { uploadPhoto } from '../../../lib/api/recipes';
import { storeRecipe } from './recipe-cache';

export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;

/** Why a photo can't be sent, or null when it may go. */
export function photoFileProblem(file: File): string | null {
  if (!(PHOTO_TYPES as readonly string[]).includes(file.type)) return 'Choose a JPEG, PNG or WebP photo.';
  if (file.size > PHOTO_MAX_BYTES) return 'That photo is larger than 5 MB.';
  return null;
}

/** Uploads a recipe's photo; `progress` runs 0..1 while it goes out, null when nothing is uploading. */
export function useUploadPhoto(recipeId: number) {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState<number | null>(null);
  const controller = useRef<AbortController | null>(null);
  const mutation = useMutation({
    mutationFn: (file: File) => {
      controller.current = new AbortController();
      setProgress(0);
      return uploadPhoto(recipeId, file, setProgress, controller.current.signal);
    },
    onSuccess: (recipe) => storeRecipe(queryClient, recipe),
    onSettled: () => {
      setProgress(null);
      controller.current = null;
    },
  });
  return { ...mutation, progress, cancel: () => controller.current?.abort() };
}
