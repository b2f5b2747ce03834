import { Link } from 'react-router';
import { Badge } from '../../../components/ui/badge';
import { formatKcal, formatMacroG } from '../../../lib/format';
import type { Client } from '../api/clients';

/** The coach's clients with their per-meal targets; each opens the client's page. */
export function ClientList({ clients, clientHref }: { clients: Client[]; clientHref: (id: number) => string }) {
  return (
    <ul aria-label="Your clients" className="grid gap-3 sm:grid-cols-2">
      {clients.map((client) => (
        <li key={client.id}>
          <Link
            to={clientHref(client.id)}
            className="flex h-full flex-col gap-2 rounded-card border border-line bg-surface p-4 shadow-card transition-colors hover:border-accent hover:bg-ember-50"
          >
            <span className="flex items-center gap-3">
              <span aria-hidden="true" className="flex size-10 shrink-0 items-center justify-center rounded-pill bg-herb-100 font-black text-herb-800">
                {client.displayName.trim().charAt(0).toUpperCase() || '?'}
              </span>
              <span className="flex min-w-0 flex-col">
                <span className="font-extrabold text-accent-strong underline-offset-2">{client.displayName}</span>
                <span className="text-sm break-all text-ink-soft">{client.email}</span>
              </span>
            </span>
            {client.targets ? (
              <span className="text-sm tabular-nums text-ink">
                <span className="font-bold">Per meal:</span> at most {formatKcal(client.targets.perMeal.kcal)}, at least{' '}
                {formatMacroG(client.targets.perMeal.proteinG)} protein
              </span>
            ) : (
              <Badge tone="honey" className="self-start">
                No targets yet
              </Badge>
            )}
          </Link>
        </li>
      ))}
    </ul>
  );
}
