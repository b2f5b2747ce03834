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
  /** when the link was last mailed: inviting the address again renews an open invitation */
  sentAt: string;
}

/** GET /api/clients */
export interface ClientsResponse {
  clients: Client[];
  invitations: Invitation[];
}

/**
 * POST /api/clients/invitations. One open invitation per address and coach: inviting an address
 * that already has one renews it (a new link, a new week, the mail sent again; the earlier link
 * stops working) and answers 200 with `renewed: true`; a first invitation answers 201.
 */
export interface SentInvitation {
  id: number;
  email: string;
  status: 'pending';
  expiresAt: string;
  renewed: boolean;
}

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
