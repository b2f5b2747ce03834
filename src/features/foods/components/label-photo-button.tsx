import { useId, useRef } from 'react';
import type { LabelScanResponse } from '../../../../shared/schemas/foods';
import { Alert } from '../../../components/ui/alert';
import { buttonClasses } from '../../../components/ui/button';
import { Spinner } from '../../../components/ui/spinner';
import { errorMessage } from '../../../lib/api-client';
import { useScanLabel } from '../api/scan-label';

/**
 * "Read a label photo": on a phone the file input opens the back camera (capture="environment"),
 * elsewhere it picks an image. The server reads the panel; the answer only fills the form.
 */
export function LabelPhotoButton({ onRead }: { onRead: (scan: LabelScanResponse) => void }) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const scan = useScanLabel();

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-3">
        <label
          htmlFor={id}
          className={buttonClasses({ variant: 'secondary', className: scan.isPending ? 'pointer-events-none gap-2 opacity-70' : 'cursor-pointer gap-2' })}
        >
          {scan.isPending && <Spinner className="size-4" />}
          {scan.isPending ? 'Reading the label…' : 'Read a label photo'}
        </label>
        <input
          ref={input}
          id={id}
          type="file"
          accept="image/*"
          capture="environment"
          className="sr-only"
          disabled={scan.isPending}
          onChange={(event) => {
            const file = event.target.files?.[0];
            if (!file) return;
            scan.mutate(file, {
              onSuccess: onRead,
              onSettled: () => {
                // the same photo chosen again should read again
                if (input.current) input.current.value = '';
              },
            });
          }}
        />
        <span className="text-sm text-ink-soft">Fill the frame with the Nutrition Facts panel, straight on, without glare.</span>
      </div>
      {scan.isError && (
        <Alert tone="danger" title="The photo wasn't read" assertive>
          {errorMessage(scan.error)}
        </Alert>
      )}
    </div>
  );
}
