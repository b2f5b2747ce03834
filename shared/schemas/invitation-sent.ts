/**
 * POST /api/clients/invitations. One open invitation per address and coach: inviting an address
 * that already has one renews it (a new link, a new week, the mail sent again; the earlier link
 * stops working) and answers 200 with `renewed: true`; a first invitation answers 201.
 */
export interface InvitationSent {
  id: number;
  email: string;
  status: 'pending';
  expiresAt: string;
  renewed: boolean;
}
