import type { SentInvitation } from '../../../shared/schemas/clients';

/** What the coach reads after sending: a second invite to an address renews its open invitation. */
export function invitationSentWords(sent: SentInvitation): string {
  return sent.renewed
    ? `${sent.email} already had an invitation from you: a fresh link is on its way, and the earlier link no longer works.`
    : `Invitation sent to ${sent.email}.`;
}
