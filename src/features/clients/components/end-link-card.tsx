import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ConfirmDialog } from '../../../components/ui/dialog';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import { useEndClientLink, type Client } from '../api/clients';

/** Stop coaching a client; confirmed first, since only a new invitation links them again. */
export function EndLinkCard({ client, onEnded }: { client: Client; onEnded: () => void }) {
  const end = useEndClientLink();
  const toast = useToast();
  const [confirming, setConfirming] = useState(false);
  return (
    <Card title="End the link" className="border-beet-200">
      <div className="flex flex-col gap-4">
        <p className="text-ink-soft">
          {client.displayName} stops getting your swaps and targets, and you can no longer see the versions they save. Their recipes stay theirs.
        </p>
        <Button variant="danger" className="self-start" onClick={() => setConfirming(true)}>
          End the link with {client.displayName}
        </Button>
      </div>
      <ConfirmDialog
        open={confirming}
        title={`Stop coaching ${client.displayName}?`}
        confirmLabel="End the link"
        destructive
        busy={end.isPending}
        onCancel={() => setConfirming(false)}
        onConfirm={() =>
          end.mutate(client.id, {
            onSuccess: () => {
              setConfirming(false);
              toast.show(`You no longer coach ${client.displayName}.`, 'success');
              onEnded();
            },
            onError: (error) => toast.show(`Couldn't end the link: ${errorMessage(error)}`, 'danger'),
          })
        }
      >
        <p>The targets you set for them are removed. To coach them again, send a new invitation.</p>
      </ConfirmDialog>
    </Card>
  );
}
