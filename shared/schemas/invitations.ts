/** GET /api/invitations/:token: public, anyone holding the link may read who sent it. */
export interface InvitationSummary {
  coachName: string;
  email: string;
  expiresAt: string;
}

/** POST /api/invitations/:token/accept */
export interface AcceptedInvitation {
  coachId: number;
  coachName: string;
}
