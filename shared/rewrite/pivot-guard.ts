import solver from 'javascript-lp-solver';

/**
 * javascript-lp-solver 1.0.3 checks its `timeout` only between branch-and-bound nodes, and its
 * phase-1 cycle detector only catches a pivot repeated back to back, so a single simplex run can
 * loop forever (seen on rewrite models: an eight-pivot cycle). Every pivot goes through
 * `Tableau.prototype.pivot`; this guard wraps it once to enforce a deadline and to stop a simplex
 * phase whose pivot sequence has repeated itself three times over. It does nothing outside `guarded`.
 */
export class SolverStalled extends Error {
  constructor(readonly reason: 'deadline' | 'cycle') {
    super(reason === 'deadline' ? 'simplex ran past its deadline' : 'simplex is cycling');
    this.name = 'SolverStalled';
  }
}

const HISTORY = 512;
const LONGEST_CYCLE = 96;
const REPEATS = 3;

interface ActiveGuard {
  deadline: number;
  count: number;
  history: Int32Array;
}

let active: ActiveGuard | null = null;
let installed = false;

function now(): number {
  return globalThis.performance?.now() ?? Date.now();
}

function cycling(guard: ActiveGuard): boolean {
  const { history, count } = guard;
  const at = (k: number) => history[(count - 1 - k) % HISTORY];
  for (let period = 1; period <= LONGEST_CYCLE && period * REPEATS <= Math.min(count, HISTORY); period++) {
    let periodic = true;
    for (let k = 0; k < period * (REPEATS - 1) && periodic; k++) periodic = at(k) === at(k + period);
    if (periodic) return true;
  }
  return false;
}

function install(): void {
  if (installed) return;
  installed = true;
  const proto = solver.Tableau.prototype;
  const pivot = proto.pivot;
  proto.pivot = function guardedPivot(this: InstanceType<typeof solver.Tableau>, row: number, column: number) {
    const guard = active;
    if (guard) {
      guard.history[guard.count % HISTORY] = row * 65536 + column;
      guard.count += 1;
      if (guard.count % 32 === 0) {
        if (now() > guard.deadline) throw new SolverStalled('deadline');
        // javascript-lp-solver switches its phase 1 to Bland's rule after max(rows, columns)
        // stalled pivots; a cycle is only called one when it outlives that remedy.
        if (guard.count > 2 * (this.height + this.width) && cycling(guard)) throw new SolverStalled('cycle');
      }
    }
    return pivot.call(this, row, column);
  };
  // A cycle lives inside one simplex phase; nodes of branch and bound may legitimately repeat
  // each other's pivots, so the history starts afresh with every phase.
  for (const phase of ['phase1', 'phase2', 'dualSimplex'] as const) {
    const run = proto[phase];
    proto[phase] = function guardedPhase(this: InstanceType<typeof solver.Tableau>) {
      if (active) active.count = 0;
      return run.call(this);
    };
  }
}

/** Runs `run` with every simplex pivot watched; throws SolverStalled when it stalls. */
export function guarded<T>(deadlineMs: number, run: () => T): T {
  install();
  const previous = active;
  active = { deadline: now() + deadlineMs, count: 0, history: new Int32Array(HISTORY) };
  try {
    return run();
  } finally {
    active = previous;
  }
}
