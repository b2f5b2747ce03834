import type { VersionKind, VersionSummary } from '../../../../shared/schemas/recipes';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { cx } from '../../../lib/cx';
import { formatKcal, formatMacroG } from '../../../lib/format';
import { formatDateTime, formatWhen } from '../../../lib/dates';
import { versionKindLabel, versionNote } from '../version-words';

const KIND_TONES: Record<VersionKind, BadgeTone> = { original: 'neutral', rewrite: 'herb', edit: 'ember' };
const MARKER_TONES: Record<VersionKind, string> = {
  original: 'border-oat-500 bg-oat-100 text-oat-800',
  rewrite: 'border-herb-600 bg-herb-50 text-herb-800',
  edit: 'border-ember-500 bg-ember-50 text-ember-800',
};

export interface VersionTimelineProps {
  versions: VersionSummary[];
  /** the version whose lines are showing */
  selected: number | null;
  onSelect: (number: number) => void;
  onRestore: (number: number) => void;
  /** the version being restored right now */
  restoring: number | null;
}

/** Every saved version, newest first: what kind it is, why it was made, and its figures per serving. */
export function VersionTimeline({ versions, selected, onSelect, onRestore, restoring }: VersionTimelineProps) {
  const newest = versions.at(-1)?.number ?? null;
  const ordered = [...versions].reverse();
  return (
    <ol className="flex flex-col">
      {ordered.map((version, index) => {
        const note = versionNote(version);
        const isSelected = version.number === selected;
        const isNewest = version.number === newest;
        return (
          <li key={version.number} className="relative flex gap-3 pb-5 last:pb-0">
            {index < ordered.length - 1 && <span aria-hidden="true" className="absolute top-10 bottom-0 left-[1.1875rem] w-0.5 bg-line" />}
            <span
              aria-hidden="true"
              className={cx(
                'relative z-10 flex size-10 shrink-0 items-center justify-center rounded-pill border-2 text-sm font-black tabular-nums',
                MARKER_TONES[version.kind],
              )}
            >
              {version.number}
            </span>
            <div
              className={cx(
                'flex min-w-0 flex-1 flex-col gap-1.5 rounded-field border px-3.5 py-3 transition-colors',
                isSelected ? 'border-accent bg-ember-50' : 'border-line bg-surface',
              )}
            >
              <div className="flex flex-wrap items-center gap-2">
                <h3 className="font-extrabold text-ink">Version {version.number}</h3>
                <Badge tone={KIND_TONES[version.kind]}>{versionKindLabel(version.kind, version.note)}</Badge>
                {isNewest && <Badge tone="ember">Newest</Badge>}
              </div>
              {note && <p className="text-ink">{note}</p>}
              <p className="flex flex-wrap gap-x-3 gap-y-0.5 text-sm text-ink-soft">
                <span>
                  <strong className="text-ink tabular-nums">{formatKcal(version.perServing.kcal)}</strong> ·{' '}
                  <strong className="text-ink tabular-nums">{formatMacroG(version.perServing.proteinG)}</strong> protein per serving
                </span>
                <span>{version.servings} servings</span>
                <time dateTime={version.createdAt} title={formatDateTime(version.createdAt)}>
                  {formatWhen(version.createdAt)}
                </time>
              </p>
              <div className="mt-1 flex flex-wrap gap-2">
                <Button variant={isSelected ? 'primary' : 'secondary'} size="sm" aria-pressed={isSelected} onClick={() => onSelect(version.number)}>
                  {isSelected ? 'Showing its lines' : 'Show its lines'}
                  <span className="sr-only"> (version {version.number})</span>
                </Button>
                {!isNewest && (
                  <Button
                    variant="quiet"
                    size="sm"
                    onClick={() => onRestore(version.number)}
                    loading={restoring === version.number}
                    loadingLabel="Restoring…"
                    disabled={restoring !== null}
                  >
                    Restore as newest<span className="sr-only"> (copy version {version.number} forward)</span>
                  </Button>
                )}
              </div>
            </div>
          </li>
        );
      })}
    </ol>
  );
}
