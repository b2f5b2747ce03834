import { constraintBounds, objectiveAttribute, type LpModel } from './lp-model';

/** Names this writer accepts: safe in CPLEX LP text and never read as a number. */
const NAME = /^[A-Za-df-zA-DF-Z_][A-Za-z0-9_]*$/;
const MAX_LINE = 240;

const KEYWORDS = /^(minimi[sz]e|maximi[sz]e|min|max|subject|such|st|s\.t\.|bounds?|binar(y|ies)|generals?|integers?|semi|free|inf|infinity|end)$/i;

function checkName(name: string, what: string): string {
  if (!NAME.test(name) || KEYWORDS.test(name)) throw new Error(`${what} name "${name}" cannot be written in LP format`);
  return name;
}

function formatNumber(n: number): string {
  if (!Number.isFinite(n)) throw new Error(`non-finite coefficient ${n}`);
  // String() gives the shortest text that reads back as the same double, so nothing is rounded.
  return String(n);
}

function linearExpression(terms: [string, number][]): string[] {
  return wrap(
    terms.map(([variable, c], i) => {
      const sign = c < 0 ? '- ' : i === 0 ? '' : '+ ';
      const magnitude = Math.abs(c) === 1 ? '' : `${formatNumber(Math.abs(c))} `;
      return `${sign}${magnitude}${variable}`;
    }),
  );
}

/** Joins pieces with spaces into lines of at most MAX_LINE characters. */
function wrap(pieces: string[]): string[] {
  const lines: string[] = [];
  let current = '';
  for (const piece of pieces) {
    if (current && current.length + piece.length + 1 > MAX_LINE) {
      lines.push(current);
      current = piece;
    } else current = current ? `${current} ${piece}` : piece;
  }
  lines.push(current);
  return lines;
}

function writeRow(name: string, terms: [string, number][], sense: '>=' | '<=' | '=', rhs: number, firstVariable: string): string {
  // An empty row still has to exist (0 ≥ 1 is how an infeasible constant row reads); LP text needs a term.
  const expression = linearExpression(terms.length ? terms : [[firstVariable, 0]]);
  const last = expression.length - 1;
  expression[last] = `${expression[last]} ${sense} ${formatNumber(rhs)}`;
  return ` ${name}: ${expression.join('\n   ')}`;
}

/**
 * The javascript-lp-solver JSON model as CPLEX LP text, read off the model object itself so the
 * text is the very model solved. A row with both bounds becomes two rows (`name` for ≥ and
 * `name_max` for ≤), as javascript-lp-solver builds it too; `binaries` go to Binaries (bounds 0..1),
 * `ints` to General, `unrestricted` variables are declared free, every other variable is ≥ 0.
 * `objectiveConstant` is written as the objective's constant term.
 */
export function toLpFormat(model: LpModel, options: { objectiveConstant?: number } = {}): string {
  const objective = objectiveAttribute(model);
  const variableNames = Object.keys(model.variables);
  if (variableNames.length === 0) throw new Error('model has no variables');
  variableNames.forEach((v) => checkName(v, 'variable'));
  const rowNames = Object.keys(model.constraints);
  if (rowNames.includes(objective)) throw new Error(`objective "${objective}" is also a constraint name`);

  const rowTerms = new Map<string, [string, number][]>(rowNames.map((r) => [r, []]));
  const objectiveTerms: [string, number][] = [];
  for (const variable of variableNames) {
    for (const [row, coefficient] of Object.entries(model.variables[variable])) {
      if (coefficient === 0) continue;
      if (row === objective) objectiveTerms.push([variable, coefficient]);
      else rowTerms.get(row)?.push([variable, coefficient]);
    }
  }

  const out: string[] = ['\\ Hearthswap model, written from the javascript-lp-solver JSON model', model.opType === 'max' ? 'Maximize' : 'Minimize'];
  const constant = options.objectiveConstant ?? 0;
  const objectiveExpression = linearExpression(objectiveTerms.length ? objectiveTerms : [[variableNames[0], 0]]);
  if (constant !== 0) {
    // The constant part the JSON model cannot hold, so that a solver on this text reaches the plan's value.
    const last = objectiveExpression.length - 1;
    const term = `${constant < 0 ? '-' : '+'} ${formatNumber(Math.abs(constant))}`;
    if (objectiveExpression[last].length + term.length + 1 > MAX_LINE) objectiveExpression.push(term);
    else objectiveExpression[last] = `${objectiveExpression[last]} ${term}`;
  }
  out.push(` obj: ${objectiveExpression.join('\n   ')}`);

  out.push('Subject To');
  const taken = new Set(rowNames);
  for (const name of rowNames) {
    checkName(name, 'constraint');
    const { min, max } = constraintBounds(model, name);
    const terms = rowTerms.get(name) ?? [];
    if (min !== undefined && min === max) {
      out.push(writeRow(name, terms, '=', min, variableNames[0]));
      continue;
    }
    if (min !== undefined) out.push(writeRow(name, terms, '>=', min, variableNames[0]));
    if (max !== undefined) {
      let upperName = min !== undefined ? `${name}_max` : name;
      while (min !== undefined && taken.has(upperName)) upperName = `${upperName}_`;
      taken.add(upperName);
      out.push(writeRow(upperName, terms, '<=', max, variableNames[0]));
    }
  }

  const free = variableNames.filter((v) => model.unrestricted?.[v]);
  if (free.length) {
    out.push('Bounds');
    for (const v of free) out.push(` ${v} free`);
  }
  const binaries = variableNames.filter((v) => model.binaries?.[v]);
  const generals = variableNames.filter((v) => model.ints?.[v] && !model.binaries?.[v]);
  if (binaries.length) out.push('Binaries', ...wrap(binaries).map((l) => ` ${l}`));
  if (generals.length) out.push('General', ...wrap(generals).map((l) => ` ${l}`));
  out.push('End', '');
  return out.join('\n');
}
