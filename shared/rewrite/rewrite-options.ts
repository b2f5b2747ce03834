import type { RewriteObjective, RewriteOptions } from './types';

export interface ResolvedOptions {
  /** t as a fraction */
  volumeTolerance: number;
  /** a as a fraction */
  lineTolerance: number;
  maxSwaps: number | null;
  objective: RewriteObjective;
  explain: boolean;
  timeoutMs: number;
  pruneDominated: boolean;
}

export function resolveOptions(options: RewriteOptions = {}): ResolvedOptions {
  const pct = (v: number | undefined, fallback: number, name: string) => {
    const value = v ?? fallback;
    if (!Number.isFinite(value) || value < 0 || value >= 100) throw new RangeError(`${name} must be in [0, 100)`);
    return value / 100;
  };
  const maxSwaps = options.maxSwaps ?? null;
  if (maxSwaps !== null && (!Number.isInteger(maxSwaps) || maxSwaps < 0)) {
    throw new RangeError('maxSwaps must be a whole number ≥ 0');
  }
  return {
    volumeTolerance: pct(options.volumeTolerancePct, 10, 'volumeTolerancePct'),
    lineTolerance: pct(options.lineTolerancePct, 25, 'lineTolerancePct'),
    maxSwaps,
    objective: options.objective ?? 'closest',
    explain: options.explain ?? false,
    timeoutMs: options.timeoutMs ?? 2000,
    pruneDominated: options.pruneDominated ?? true,
  };
}
