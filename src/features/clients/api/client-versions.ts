import { useQuery } from '@tanstack/react-query';
import { clientVersionsQuery } from '../../../lib/api/clients';

export type { ClientVersion } from '../../../../shared/schemas/clients';

/** The client's most recently saved versions, newest first (the server sends up to 50). */
export function useClientVersions(clientId: number | null) {
  return useQuery({ ...clientVersionsQuery(clientId), select: (data) => data.versions });
}
