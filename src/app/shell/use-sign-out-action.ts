import { useLocation } from 'react-router';
import { useToast } from '../../components/ui/toast';
import { useSignOut } from '../../features/auth/api/sign-out';
import { errorMessage } from '../../lib/api-client';
import { useAuth } from '../auth-context';

/**
 * Signs out and says so. The page it started from is noted first, so a members-only page
 * sends the person to the Kitchen rather than to the sign-in form they just left by choice.
 */
export function useSignOutAction() {
  const auth = useAuth();
  const location = useLocation();
  const toast = useToast();
  const mutation = useSignOut();
  return {
    signOut: async () => {
      auth.noteSignOut(location.pathname);
      try {
        // mutateAsync rather than mutate's callbacks: the page that asked may be gone by the time it lands.
        await mutation.mutateAsync();
        toast.show('You are signed out.', 'success');
      } catch (error) {
        auth.noteSignOut(null);
        toast.show(`Sign-out didn't go through: ${errorMessage(error)}`, 'danger');
      }
    },
    signingOut: mutation.isPending,
  };
}
