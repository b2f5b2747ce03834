import { useState } from 'react';
import { Card } from '../../components/ui/card';
import { EmptyState } from '../../components/ui/empty-state';
import { Page } from '../../components/ui/page';
import { ingredientLines, RecipeInputForm } from '../../features/analysis/components/recipe-input-form';

interface Submission {
  lines: string[];
  servings: number;
}

export function KitchenPage() {
  const [submission, setSubmission] = useState<Submission | null>(null);

  return (
    <Page
      title="Kitchen"
      description="Paste a recipe you love. Hearthswap reads every ingredient line, weighs it in grams, and works out calories, protein, carbs, fat, fiber, sugar and sodium per serving. Then it looks for lighter foods that play the same part in the dish, so the plate stays just as full."
    >
      <div className="grid gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card title="Your recipe" description="Sign-in is not needed to try it.">
          <RecipeInputForm onSubmit={(text, servings) => setSubmission({ lines: ingredientLines(text), servings })} />
        </Card>
        <section aria-labelledby="kitchen-reading" className="flex flex-col gap-4">
          <h2 id="kitchen-reading" className="text-xl font-extrabold">
            What Hearthswap reads
          </h2>
          {submission ? (
            <Card as="div" className="shadow-none">
              <p className="mb-3 font-bold">
                {submission.lines.length} ingredient line{submission.lines.length === 1 ? '' : 's'} for{' '}
                {submission.servings} serving{submission.servings === 1 ? '' : 's'}
              </p>
              <ol className="flex list-decimal flex-col gap-1.5 pl-6 marker:font-bold marker:text-oat-600">
                {submission.lines.map((line, index) => (
                  <li key={`${index}-${line}`}>{line}</li>
                ))}
              </ol>
            </Card>
          ) : (
            <EmptyState title="Nothing on the board yet">
              Paste an ingredient list and press Analyse recipe: every line Hearthswap will read, and for how many
              servings, shows up here.
            </EmptyState>
          )}
        </section>
      </div>
    </Page>
  );
}
