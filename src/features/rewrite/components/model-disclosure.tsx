import { useState } from 'react';
import type { RewriteRequest } from '../../../../shared/schemas/rewrite';
import { CopyTextButton } from '../../../components/ui/copy-text-button';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { formatNumber } from '../../../lib/format';
import { useRewriteModel } from '../api/get-rewrite-model';

/** For the curious: the exact mixed-integer program behind the answer, asked for only when opened. */
export function ModelDisclosure({ request, signature }: { request: RewriteRequest; signature: string }) {
  const [open, setOpen] = useState(false);
  const model = useRewriteModel(request, signature, open);
  const lines = model.data ? model.data.split('\n').length : 0;

  return (
    <details className="rounded-field border border-line bg-oat-50 px-4 py-2" onToggle={(event) => setOpen(event.currentTarget.open)}>
      <summary className="min-h-9 cursor-pointer py-1.5 font-bold">
        Advanced: the calculation behind this answer <span className="font-semibold text-ink-soft">(for checking it elsewhere)</span>
      </summary>
      <div className="flex flex-col gap-3 pt-2 pb-3">
        <p className="text-sm text-ink-soft">
          Not needed to cook. This is the exact optimisation problem Hearthswap worked out for this answer, as plain text in the standard LP file format: one
          yes/no choice per candidate food and line, its grams, how far each line and the dish may change, and your targets. Anyone with optimisation software
          can paste it in and check the answer.
        </p>
        {model.isPending && open && <LoadingState label="Asking for the calculation…" className="py-2" />}
        {model.isError && (
          <ErrorState title="The calculation didn’t load" error={model.error} onRetry={() => void model.refetch()} retrying={model.isFetching} />
        )}
        {model.data !== undefined &&
          (model.data ? (
            <>
              <div className="flex flex-wrap items-center justify-between gap-2">
                <span className="text-sm font-semibold text-ink-soft">{formatNumber(lines, 0)} lines</span>
                <CopyTextButton text={model.data} copiedMessage="The calculation is on the clipboard.">
                  Copy the text
                </CopyTextButton>
              </div>
              <pre
                tabIndex={0}
                aria-label="The calculation as LP text"
                className="max-h-96 overflow-auto rounded-field border border-line-strong bg-surface p-3 font-mono text-xs leading-relaxed whitespace-pre text-ink"
              >
                {model.data}
              </pre>
            </>
          ) : (
            <p className="text-sm text-ink-soft">The server sent no calculation for this answer.</p>
          ))}
      </div>
    </details>
  );
}
