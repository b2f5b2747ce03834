import { EmptyState } from '../../components/ui/empty-state';
import { Page } from '../../components/ui/page';

export function SwapLibraryPage() {
  return (
    <Page
      title="Swap library"
      description="The swaps you stand behind: a lighter food in place of another, or for a whole role such as melting cheese, each with a cooking note like 'bake 5 minutes longer for melt'. Publish the library and your clients' rewrites try your swaps first."
    >
      <EmptyState title="No approved swaps yet">
        Add a swap by choosing the food it replaces and the one to use instead, with a note on how to cook it.
      </EmptyState>
    </Page>
  );
}
