import type { VersionKind } from '../../../shared/schemas/recipes';

const KIND_WORDS: Record<VersionKind, string> = {
  original: 'As first written',
  rewrite: 'Hearthswap rewrite',
  edit: 'Their own edit',
};

export function versionKindWords(kind: string): string {
  return KIND_WORDS[kind as VersionKind] ?? kind;
}
