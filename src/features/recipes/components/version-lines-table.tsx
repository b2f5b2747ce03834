import type { VersionDetail } from '../../../../shared/schemas/recipes';
import { incompleteLineNumbers } from '../../../../shared/line-status';
import { DataTable } from '../../../components/ui/table';
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
      <DataTable
        caption={caption}
        captionHidden
        density="snug"
        cardsBelow="sm"
        cardColumns={3}
        className="sm:rounded-field"
        rows={version.lines}
        rowKey={(_, i) => i}
        columns={[
          {
            key: 'line',
            header: 'Ingredient',
            rowHeader: true,
            className: 'font-normal sm:px-4',
            cell: (line) => (
              <>
                <span className="block font-bold text-ink">{writtenLine(line) ?? line.foodName}</span>
                <MatchedFood line={line} />
                <LineFlags line={line} />
              </>
            ),
          },
          { key: 'grams', header: 'Grams', align: 'right', className: 'whitespace-nowrap sm:px-4', cell: (line) => formatGrams(line.grams) },
          { key: 'kcal', header: 'Energy', align: 'right', className: 'whitespace-nowrap sm:px-4', cell: (line) => formatKcal(line.nutrients.kcal) },
          { key: 'protein', header: 'Protein', align: 'right', className: 'whitespace-nowrap sm:px-4', cell: (line) => formatMacroG(line.nutrients.proteinG) },
        ]}
        footer={[
          {
            key: 'dish',
            label: 'Whole dish',
            cells: { grams: formatGrams(dishGrams), kcal: formatKcal(version.totals.kcal), protein: formatMacroG(version.totals.proteinG) },
          },
          {
            key: 'serving',
            label: (
              <span className="font-extrabold">
                Per serving <span className="font-semibold text-ink-soft">(of {version.servings})</span>
              </span>
            ),
            cells: {
              grams: formatGrams(dishGrams / version.servings),
              kcal: <strong className="font-extrabold">{formatKcal(version.perServing.kcal)}</strong>,
              protein: <strong className="font-extrabold">{formatMacroG(version.perServing.proteinG)}</strong>,
            },
          },
        ]}
      />
    </>
  );
}
