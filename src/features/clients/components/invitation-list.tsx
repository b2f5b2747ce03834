import { useState } from 'react';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/dialog';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import { useInviteClient, useWithdrawInvitation, type Invitation, type InvitationStatus } from '../api/clients';
import { invitationSentWords } from '../invitation-words';
import { formatDay } from '../../../lib/dates';

const STATUS: Record<InvitationStatus, { label: string; tone: BadgeTone }> = {
  pending: { label: 'Waiting', tone: 'honey' },
  accepted: { label: 'Accepted', tone: 'herb' },
  expired: { label: 'Expired', tone: 'neutral' },
  revoked: { label: 'Withdrawn', tone: 'beet' },
};

function statusLine(invitation: Invitation): string {
  if (invitation.status === 'pending') return `Sent ${formatDay(invitation.sentAt)} · works until ${formatDay(invitation.expiresAt)}`;
  if (invitation.status === 'expired') return `Sent ${formatDay(invitation.sentAt)} · expired ${formatDay(invitation.expiresAt)}`;
  return `Sent ${formatDay(invitation.createdAt)}`;
}

/** Every invitation the coach sent, newest first, with a way to withdraw the ones still waiting. */
export function InvitationList({ invitations }: { invitations: Invitation[] }) {
  const withdraw = useWithdrawInvitation();
  const resend = useInviteClient();
  const toast = useToast();
  const [confirming, setConfirming] = useState<Invitation | null>(null);

  return (
    <>
      <ul aria-label="Invitations you sent" className="flex flex-col divide-y divide-line">
        {invitations.map((invitation) => {
          const status = STATUS[invitation.status];
          return (
            <li key={invitation.id} className="flex flex-wrap items-center justify-between gap-x-4 gap-y-2 py-3 first:pt-0 last:pb-0">
              <div className="flex min-w-0 flex-col">
                <span className="font-bold break-all text-ink">{invitation.email}</span>
                <span className="text-sm text-ink-soft">{statusLine(invitation)}</span>
              </div>
              <div className="flex items-center gap-2">
                <Badge tone={status.tone}>{status.label}</Badge>
                {(invitation.status === 'pending' || invitation.status === 'expired') && (
                  <Button
                    variant="quiet"
                    size="sm"
                    loading={resend.isPending && resend.variables === invitation.email}
                    loadingLabel="Sending…"
                    onClick={() =>
                      resend.mutate(invitation.email, {
                        onSuccess: (sent) => toast.show(invitationSentWords(sent), 'success'),
                        onError: (error) => toast.show(`Couldn't send it again: ${errorMessage(error)}`, 'danger'),
                      })
                    }
                  >
                    Send again<span className="sr-only"> to {invitation.email}</span>
                  </Button>
                )}
                {invitation.status === 'pending' && (
                  <Button variant="quiet" size="sm" onClick={() => setConfirming(invitation)}>
                    Withdraw<span className="sr-only"> the invitation to {invitation.email}</span>
                  </Button>
                )}
              </div>
            </li>
          );
        })}
      </ul>
      <ConfirmDialog
        open={confirming !== null}
        title="Withdraw this invitation?"
        confirmLabel="Withdraw it"
        destructive
        busy={withdraw.isPending}
        onCancel={() => setConfirming(null)}
        onConfirm={() => {
          if (!confirming) return;
          const invitation = confirming;
          withdraw.mutate(invitation.id, {
            onSuccess: () => {
              setConfirming(null);
              toast.show(`Withdrew the invitation to ${invitation.email}.`, 'success');
            },
            onError: (error) => toast.show(`Couldn't withdraw it: ${errorMessage(error)}`, 'danger'),
          });
        }}
      >
        {confirming && <p>The link sent to {confirming.email} stops working. You can invite them again later.</p>}
      </ConfirmDialog>
    </>
  );
}
