import { Card } from '../../../components/ui/card';

/** What a coach adds, for a cook who has none, and how the link is made. */
export function NoCoachExplainer({ email }: { email: string }) {
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <Card title="What a coach does here">
        <ul className="flex list-none flex-col gap-3">
          {[
            [
              'Approved swaps',
              'They keep a library of swaps they stand behind, each with a cooking note such as “bake 5 minutes longer for melt”. Every rewrite you ask for tries their swaps first.',
            ],
            ['Your targets', 'They set your calories and protein per meal — and per day — from your body stats and goal. Rewrites aim for them by default.'],
            ['A second look', 'They can read the recipe versions you save and leave a comment on any of them.'],
          ].map(([title, text]) => (
            <li key={title} className="flex gap-3">
              <span aria-hidden="true" className="mt-2.5 size-2 shrink-0 rounded-pill bg-accent" />
              <span>
                <span className="font-bold text-ink">{title}. </span>
                <span className="text-ink-soft">{text}</span>
              </span>
            </li>
          ))}
        </ul>
      </Card>
      <Card title="How to join a coach" headingLevel={2}>
        <ol className="flex list-decimal flex-col gap-2 pl-5 text-ink-soft marker:font-bold marker:text-ink">
          <li>
            Ask your coach to invite <strong className="text-ink break-all">{email}</strong>, the e-mail address on your account.
          </li>
          <li>Open the link in the invitation. It works for 7 days.</li>
          <li>Accept, and their swaps and targets appear on this page.</li>
        </ol>
        <p className="mt-4 text-sm text-ink-soft">You can leave a coach at any time. Hearthswap works just as well without one.</p>
      </Card>
    </div>
  );
}
