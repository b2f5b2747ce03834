import type { VersionDetail } from '../../../../shared/schemas/recipes';
import { incompleteLineNumbers } from '../../../../shared/line-status';
import { Badge } from '../../../components/ui/badge';
import { IncompleteTotalsAlert } from '../../../components/ui/incomplete-totals-alert';
import { formatGrams, formatKcal, formatMacroG } from '../../../lib/format';
import { writtenLine } from '../version-words';

/** "Check this match" and the warnings a line was saved with, when it has any. */
function LineFlags({ line }: { line: VersionDetail['lines'][number] }) {
  if (!line.checkMatch && line.warnings.length === 0) return null;
  return (
    <span className="mt-1 flex flex-col gap-0.5 text-sm font-semibold text-honey-800">
      {line.checkMatch && line.foodName && (
        <span>
          <Badge tone="honey">Check this match</Badge>
        </span>
      )}
      {line.warnings.map((w) => (
        <span key={w}>▲ {w}</span>
      ))}
    </span>
  );
}

/** The catalogue food a line was matched to, under the line as the cook wrote it. */
function MatchedFood({ line }: { line: VersionDetail['lines'][number] }) {
  if (!line.foodName)
    return (
      <span className="block">
        <Badge tone="honey" title="No catalogue food matched this line, so it counts nothing">
          No food matched
        </Badge>
      </span>
    );
  if (!writtenLine(line)) return null;
  return <span className="block text-sm text-ink-soft">matched: {line.foodName}</span>;
}

/**
 * A version's ingredients as the cook wrote them: grams, the food each was matched to, and what the line brings to the whole
 * dish, with the dish and one serving at the foot.
 */
export function VersionLinesTable({ version, caption }: { version: VersionDetail; caption: string }) {
  const dishGrams = version.lines.reduce((sum, l) => sum + l.grams, 0);
  return (
    <>
      <IncompleteTotalsAlert lineNumbers={incompleteLineNumbers(version.lines)} className="mb-3" />
      <div className="hidden overflow-x-auto rounded-field border border-line sm:block">
        <table className="w-full border-collapse text-base">
          <caption className="sr-only">{caption}</caption>
          <thead>
            <tr className="border-b border-line bg-oat-100 text-left">
              <th scope="col" className="px-3 py-2 font-bold sm:px-4">
                Ingredient
              </th>
              <th scope="col" className="px-3 py-2 text-right font-bold sm:px-4">
                Grams
              </th>
              <th scope="col" className="px-3 py-2 text-right font-bold sm:px-4">
                Energy
              </th>
              <th scope="col" className="px-3 py-2 text-right font-bold sm:px-4">
                Protein
              </th>
            </tr>
          </thead>
          <tbody>
            {version.lines.map((line, i) => (
              <tr key={i} className="border-b border-line align-top last:border-b-0 even:bg-oat-50">
                <th scope="row" className="px-3 py-2 text-left font-normal sm:px-4">
                  <span className="block font-bold text-ink">{writtenLine(line) ?? line.foodName}</span>
                  <MatchedFood line={line} />
                  <LineFlags line={line} />
                </th>
                <td className="px-3 py-2 text-right whitespace-nowrap tabular-nums sm:px-4">{formatGrams(line.grams)}</td>
                <td className="px-3 py-2 text-right whitespace-nowrap tabular-nums sm:px-4">{formatKcal(line.nutrients.kcal)}</td>
                <td className="px-3 py-2 text-right whitespace-nowrap tabular-nums sm:px-4">{formatMacroG(line.nutrients.proteinG)}</td>
              </tr>
            ))}
          </tbody>
          <tfoot className="border-t-2 border-line-strong">
            <tr>
              <th scope="row" className="px-3 pt-2 text-left font-bold sm:px-4">
                Whole dish
              </th>
              <td className="px-3 pt-2 text-right whitespace-nowrap tabular-nums sm:px-4">{formatGrams(dishGrams)}</td>
              <td className="px-3 pt-2 text-right whitespace-nowrap tabular-nums sm:px-4">{formatKcal(version.totals.kcal)}</td>
              <td className="px-3 pt-2 text-right whitespace-nowrap tabular-nums sm:px-4">{formatMacroG(version.totals.proteinG)}</td>
            </tr>
            <tr>
              <th scope="row" className="px-3 pt-1 pb-2 text-left font-extrabold sm:px-4">
                Per serving <span className="font-semibold text-ink-soft">(of {version.servings})</span>
              </th>
              <td className="px-3 pt-1 pb-2 text-right whitespace-nowrap tabular-nums sm:px-4">{formatGrams(dishGrams / version.servings)}</td>
              <td className="px-3 pt-1 pb-2 text-right font-extrabold whitespace-nowrap tabular-nums sm:px-4">{formatKcal(version.perServing.kcal)}</td>
              <td className="px-3 pt-1 pb-2 text-right font-extrabold whitespace-nowrap tabular-nums sm:px-4">{formatMacroG(version.perServing.proteinG)}</td>
            </tr>
          </tfoot>
        </table>
      </div>

      <div className="flex flex-col sm:hidden">
        <ul aria-label={caption} className="flex flex-col rounded-field border border-line">
          {version.lines.map((line, i) => (
            <li key={i} className="flex flex-col gap-0.5 border-b border-line px-3 py-2.5 last:border-b-0 even:bg-oat-50">
              <span className="font-bold text-ink">{writtenLine(line) ?? line.foodName}</span>
              <MatchedFood line={line} />
              <LineFlags line={line} />
              <span className="text-sm tabular-nums">
                <strong>{formatGrams(line.grams)}</strong> · {formatKcal(line.nutrients.kcal)} · {formatMacroG(line.nutrients.proteinG)} protein
              </span>
            </li>
          ))}
        </ul>
        <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="font-bold">Whole dish</dt>
          <dd className="text-right tabular-nums">
            {formatGrams(dishGrams)} · {formatKcal(version.totals.kcal)} · {formatMacroG(version.totals.proteinG)} protein
          </dd>
          <dt className="font-extrabold">Per serving (of {version.servings})</dt>
          <dd className="text-right font-extrabold tabular-nums">
            {formatKcal(version.perServing.kcal)} · {formatMacroG(version.perServing.proteinG)} protein
          </dd>
        </dl>
      </div>
    </>
  );
}
