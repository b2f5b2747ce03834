import { useQuery } from '@tanstack/react-query';
import { meQuery } from '../../../lib/api/auth';

export function useMe() {
  return useQuery(meQuery);
}
