import type { Nutrients } from '../nutrition';
import type { ClientTargets } from './coaching';
import type { VersionKind } from './recipes';

/** One of a coach's clients, with the targets the coach set (null: none yet). */
export interface Client {
  id: number;
  displayName: string;
  email: string;
  targets: ClientTargets | null;
}

export const INVITATION_STATUSES = ['pending', 'accepted', 'expired', 'revoked'] as const;
export type InvitationStatus = (typeof INVITATION_STATUSES)[number];

/** An invitation as its coach sees it in the list. */
export interface Invitation {
  id: number;
  email: string;
  status: InvitationStatus;
  expiresAt: string;
  createdAt: string;
}

/** GET /api/clients */
export interface ClientsResponse {
  clients: Client[];
  invitations: Invitation[];
}

/** POST /api/clients/invitations (201) */
export type SentInvitation = Omit<Invitation, 'createdAt'>;

/** PUT /api/clients/:id/targets */
export interface SavedClientTargets {
  clientId: number;
  targets: ClientTargets;
}

/** One of a client's saved versions as GET /api/clients/:id/versions lists them (newest first, up to 50). */
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

/** GET /api/clients/:id/versions */
export interface ClientVersionsResponse {
  versions: ClientVersion[];
}
