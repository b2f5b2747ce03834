import type { SetAsideLine } from '../../../../shared/recipe-text';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { countOf } from '../../../lib/words';

export interface SetAsideNoteProps {
  reading: { title: string | null; servings: number | null; setAside: SetAsideLine[] };
  servings: number;
  onUseServings: (servings: number) => void;
}

/** Tells the cook which pasted lines were not read as ingredients, and offers the recipe's own servings. */
export function SetAsideNote({ reading, servings, onUseServings }: SetAsideNoteProps) {
  const count = (why: SetAsideLine['why']) => reading.setAside.filter((l) => l.why === why).length;
  const parts = [
    reading.title && `the title “${reading.title}”`,
    count('servings') > 0 && reading.servings !== null && `“serves ${reading.servings}”`,
    count('heading') > 0 && countOf(count('heading'), 'heading'),
    count('method') > 0 && countOf(count('method'), 'method step'),
    count('note') > 0 && countOf(count('note'), 'note line'),
  ].filter((p): p is string => Boolean(p));
  if (parts.length === 0) return null;
  const offerServings = reading.servings !== null && reading.servings !== servings && reading.servings >= 1 && reading.servings <= 50;
  return (
    <Alert
      tone="info"
      title="Only the ingredients were weighed"
      action={
        offerServings ? (
          <Button variant="secondary" size="sm" onClick={() => onUseServings(reading.servings!)}>
            Use {countOf(reading.servings!, 'serving')}
          </Button>
        ) : undefined
      }
    >
      Left out of the lines: {parts.join(', ')}.{offerServings && ` The recipe says it serves ${reading.servings}; the numbers below are for ${servings}.`}
    </Alert>
  );
}
