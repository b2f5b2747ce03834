import { useQuery } from '@tanstack/react-query';
import type { Nutrients } from '../../../../shared/nutrition';
import type { VersionKind } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { clientsKeys } from '../clients-keys';

export interface ClientVersion {
  recipeId: number;
  recipeTitle: string;
  number: number;
  kind: VersionKind;
  perServing: Nutrients;
  note: string;
  comments: number;
  createdAt: string;
}

/** The client's most recently saved versions, newest first (the server sends up to 50). */
export function useClientVersions(clientId: number | null) {
  return useQuery({
    queryKey: clientsKeys.versions(clientId ?? 0),
    queryFn: ({ signal }) => api.get<{ versions: ClientVersion[] }>(`/api/clients/${clientId}/versions`, { signal }),
    enabled: clientId !== null,
    select: (data) => data.versions,
  });
}
