import { useState } from 'react';
import { ROLES_USER, type PublicUser, type UserRole } from '../../../../shared/schemas/auth';
import { Alert } from '../../../components/ui/alert';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { SelectField } from '../../../components/ui/select-field';
import { LoadingState } from '../../../components/ui/spinner';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import { useSetRole, useUsers } from '../api/users';
import { countOf } from '../../../lib/words';

const ROLE_WORDS: Record<UserRole, string> = { cook: 'Cook', coach: 'Coach', admin: 'Admin' };

function PersonRow({ person, isSelf, coachName }: { person: PublicUser; isSelf: boolean; coachName: string | null }) {
  const setRole = useSetRole();
  const toast = useToast();
  const [error, setError] = useState<string | null>(null);
  return (
    <li className="flex flex-col gap-3 rounded-card border border-line bg-surface p-4 shadow-card sm:flex-row sm:items-center sm:justify-between">
      <div className="flex min-w-0 flex-col gap-0.5">
        <span className="font-extrabold break-words text-ink">
          {person.displayName}
          {isSelf && <span className="font-semibold text-ink-soft"> (you)</span>}
        </span>
        <span className="text-sm break-all text-ink-soft">{person.email}</span>
        {coachName && <span className="text-sm text-ink-soft">Coached by {coachName}</span>}
        {error && <span className="text-sm font-semibold text-beet-700">{error}</span>}
      </div>
      <SelectField
        label={`Role of ${person.displayName}`}
        labelHidden
        containerClassName="sm:w-40"
        value={person.role}
        disabled={setRole.isPending || isSelf}
        title={isSelf ? 'Another admin can change your role.' : undefined}
        onChange={(event) => {
          const role = event.target.value as UserRole;
          setError(null);
          setRole.mutate(
            { id: person.id, role },
            {
              onSuccess: (user) => toast.show(`${user.displayName} is now ${ROLE_WORDS[user.role].toLowerCase()}.`, 'success'),
              onError: (e) => setError(errorMessage(e)),
            },
          );
        }}
      >
        {ROLES_USER.map((role) => (
          <option key={role} value={role}>
            {ROLE_WORDS[role]}
          </option>
        ))}
      </SelectField>
    </li>
  );
}

/** Every account with its role; an admin changes anyone's role but their own. */
export function PeopleList({ selfId }: { selfId: number | null }) {
  const users = useUsers();
  if (users.isPending) return <LoadingState label="Listing accounts…" />;
  if (users.isError)
    return <ErrorState title="The accounts didn't load" error={users.error} onRetry={() => void users.refetch()} retrying={users.isFetching} />;
  if (users.data.length === 0) return <EmptyState title="No accounts yet">Accounts appear here as people sign up.</EmptyState>;
  const names = new Map(users.data.map((u) => [u.id, u.displayName]));
  const counts = ROLES_USER.map((role) => {
    const n = users.data.filter((u) => u.role === role).length;
    return countOf(n, ROLE_WORDS[role].toLowerCase());
  });
  return (
    <div className="flex flex-col gap-4">
      <Alert tone="info">
        {countOf(users.data.length, 'account')}: {counts.join(', ')}. A new role takes effect on that person's next page load.
      </Alert>
      <ul aria-label="Accounts" className="flex flex-col gap-3">
        {users.data.map((person) => (
          <PersonRow key={person.id} person={person} isSelf={person.id === selfId} coachName={person.coachId ? (names.get(person.coachId) ?? null) : null} />
        ))}
      </ul>
    </div>
  );
}
