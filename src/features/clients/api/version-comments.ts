import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { UserRole } from '../../../lib/user';
import { api } from '../../../lib/api-client';
import { clientsKeys } from '../clients-keys';

export interface VersionComment {
  id: number;
  body: string;
  author: { id: number; displayName: string; role: UserRole };
  createdAt: string;
}

function path(recipeId: number, number: number) {
  return `/api/recipes/${recipeId}/versions/${number}/comments`;
}

export function useVersionComments(recipeId: number, number: number) {
  return useQuery({
    queryKey: clientsKeys.comments(recipeId, number),
    queryFn: ({ signal }) => api.get<{ comments: VersionComment[] }>(path(recipeId, number), { signal }),
    select: (data) => data.comments,
  });
}

export function useAddVersionComment(recipeId: number, number: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: string) => api.post<{ comments: VersionComment[] }>(path(recipeId, number), { body }),
    onSuccess: (data) => {
      queryClient.setQueryData(clientsKeys.comments(recipeId, number), data);
      // The versions list counts comments.
      void queryClient.invalidateQueries({ queryKey: ['clients', 'detail'] });
    },
  });
}
