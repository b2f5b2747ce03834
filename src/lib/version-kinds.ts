import type { VersionKind, VersionSummary } from '../../shared/schemas/recipes';

/** Kinds of version in the cook's words. */
export const VERSION_KIND_LABELS: Record<VersionKind, string> = {
  original: 'As written',
  rewrite: 'Lighter rewrite',
  edit: 'Your edit',
};

const RESTORED = /^Restored from version \d+/;

/** The kind in the cook's words; a version restored from an older one says so instead of "Your edit". */
export function versionKindLabel(kind: VersionKind, note?: string): string {
  if (kind === 'edit' && note && RESTORED.test(note.trim())) return 'Restored';
  return VERSION_KIND_LABELS[kind] ?? kind;
}

/** "Version 2 · Lighter rewrite", "Version 4 · Restored" */
export function versionTitle(version: Pick<VersionSummary, 'number' | 'kind'> & { note?: string }): string {
  return `Version ${version.number} · ${versionKindLabel(version.kind, version.note)}`;
}

/** The version's note, unless it only repeats the kind ("As written" on an original). */
export function versionNote(version: Pick<VersionSummary, 'kind' | 'note'>): string | null {
  const note = version.note.trim();
  if (!note || note.toLowerCase() === versionKindLabel(version.kind, note).toLowerCase()) return null;
  return note;
}
