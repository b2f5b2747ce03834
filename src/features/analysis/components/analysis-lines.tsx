import { useEffect, useRef, useState, type ReactNode } from 'react';
import type { AnalyzedLine, FoodSummary } from '../../../../shared/schemas/analyze';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { DataTable } from '../../../components/ui/table';
import { Spinner } from '../../../components/ui/spinner';
import { cx } from '../../../lib/cx';
import { formatGrams, formatKcal, formatMacroG, formatNumber, everydayWeight } from '../../../lib/format';
import type { UnitSystem } from '../../../lib/user';
import { formatParsedAmount } from '../amount-words';
import type { KitchenLine } from '../kitchen-lines';
import { LineFoodPicker } from './line-food-picker';
import { LineGramsField } from './line-grams-field';
import { LineRolePicker } from './line-role-picker';
import type { LineFunction } from '../../../../shared/culinary/types';

/** Under this the match is worth a second look (the matcher's own "weak match" mark is 0.6). */
export const CHECK_MATCH_BELOW = 0.6;

export interface FoodSearchSlotArgs {
  label: string;
  onChoose: (food: FoodSummary) => void;
  onClose: () => void;
}

export interface AnalysisLinesProps {
  lines: KitchenLine[];
  analysedLine: (key: string) => AnalyzedLine | null;
  unitSystem: UnitSystem;
  /** the figures on screen are from before the last edit */
  stale: boolean;
  totals: { grams: number; kcal: number; proteinG: number } | null;
  onChooseFood: (key: string, food: FoodSummary | null) => void;
  onSetGrams: (key: string, grams: number | null) => void;
  /** what the line does in the dish, or null for Hearthswap's reading */
  onSetRole?: (key: string, role: LineFunction | null) => void;
  onRemove: (key: string) => void;
  /** a catalogue search for one line, rendered by the page (features do not import each other) */
  renderFoodSearch?: (args: FoodSearchSlotArgs) => ReactNode;
  foodHref?: (id: number) => string;
  /** where the cook adds a packaged food from its label (shown when a line asks for a food the catalogue lacks) */
  addFoodHref?: string;
}

function sourceNote(food: FoodSummary): string {
  return food.source === 'usda-sr28' ? 'About this food' : 'From a label';
}

/** "1 cup, fluid (yields 2 cups whipped)" → "1 cup": the measure, without the catalogue's asides. */
function measureWords(portion: string): string {
  return portion
    .replace(/\s*\([^)]*\)/g, '')
    .split(',')[0]
    .trim();
}

type LineActions = Omit<AnalysisLinesProps, 'lines' | 'analysedLine' | 'stale' | 'totals' | 'unitSystem'>;
interface Row {
  line: KitchenLine;
  index: number;
  analysed: AnalyzedLine | null;
}

// A line with no food needs a food first, unless it also gave no amount ("salt to taste").
function needsAmount({ line, analysed }: Row): boolean {
  return Boolean(analysed && analysed.grams === 0 && line.grams === undefined && (analysed.food !== null || analysed.parsed.quantity === null));
}

function IngredientCell({ line, index, analysed }: Row) {
  return (
    <span className="flex items-start gap-2">
      <span aria-hidden="true" className="mt-0.5 font-bold text-oat-500 tabular-nums">
        {index + 1}.
      </span>
      <span className="flex min-w-0 flex-col gap-1">
        <span className="font-bold break-words text-ink">{line.input}</span>
        {analysed && analysed.parsed.name && !(analysed.pinned.food && analysed.pinned.grams) && (
          <span className="text-sm text-ink-soft">
            Read as “{analysed.parsed.name}”{analysed.parsed.comment ? `, ${analysed.parsed.comment}` : ''}
          </span>
        )}
        {analysed && analysed.warnings.length > 0 && (
          <ul className="flex flex-col gap-0.5 text-sm font-semibold text-honey-800">
            {analysed.warnings.map((w) => (
              <li key={w} className="flex gap-1.5">
                <span aria-hidden="true">▲</span>
                <span>{w}</span>
              </li>
            ))}
          </ul>
        )}
      </span>
    </span>
  );
}

function AmountCell({ analysed }: Row) {
  if (!analysed) return <span className="text-ink-soft">…</span>;
  const amount = formatParsedAmount(analysed.parsed);
  return (
    <span className="flex flex-col">
      <span className="font-semibold tabular-nums">{amount ?? <span className="text-ink-soft">none given</span>}</span>
      {analysed.portionUsed && <span className="text-sm text-ink-soft">by USDA’s weight for {measureWords(analysed.portionUsed)}</span>}
    </span>
  );
}

function FoodCell({
  row: { line, index, analysed },
  onChooseFood,
  onSetRole,
  renderFoodSearch,
  foodHref,
  addFoodHref,
}: Pick<LineActions, 'onChooseFood' | 'onSetRole' | 'renderFoodSearch' | 'foodHref' | 'addFoodHref'> & { row: Row }) {
  const [searching, setSearching] = useState(false);
  const pickerRef = useRef<HTMLSelectElement>(null);
  // Back from a catalogue search, the keyboard lands on the line's food again: searches ended are
  // counted in the handler and acted on once in the effect, so the search slot's callbacks touch no ref.
  const [searchesEnded, setSearchesEnded] = useState(0);
  const focusedAfter = useRef(0);
  useEffect(() => {
    if (searching || searchesEnded === focusedAfter.current) return;
    focusedAfter.current = searchesEnded;
    pickerRef.current?.focus();
  }, [searching, searchesEnded]);
  function endSearch() {
    setSearchesEnded((n) => n + 1);
    setSearching(false);
  }
  // Foods the cook picked from the catalogue stay in the picker even before the server answers.
  const [picked, setPicked] = useState<FoodSummary[]>([]);
  const number = index + 1;
  const food = analysed?.food ?? null;
  const shownFood = line.foodId !== undefined ? (picked.find((p) => p.id === line.foodId) ?? food) : food;
  const checkMatch = Boolean(food && analysed && !analysed.pinned.food && (analysed.checkMatch || analysed.confidence < CHECK_MATCH_BELOW));
  const missingModifier = analysed && !analysed.pinned.food ? analysed.missingModifier : null;

  function choose(next: FoodSummary | null) {
    if (next) setPicked((list) => [next, ...list.filter((p) => p.id !== next.id)].slice(0, 5));
    onChooseFood(line.key, next);
  }

  if (!analysed && line.foodId === undefined)
    return (
      <span className="inline-flex items-center gap-2 text-ink-soft">
        <Spinner className="size-4" /> Matching…
      </span>
    );
  return (
    <div className="flex flex-col gap-1.5">
      {searching && renderFoodSearch ? (
        renderFoodSearch({
          label: `Find the food for line ${number}`,
          onChoose: (f) => {
            endSearch();
            choose(f);
          },
          onClose: endSearch,
        })
      ) : (
        <LineFoodPicker
          ref={pickerRef}
          label={`Food for line ${number}`}
          food={shownFood}
          options={[...picked, ...(analysed?.alternatives ?? [])]}
          pinned={line.foodId !== undefined}
          onChoose={choose}
          onSearch={renderFoodSearch ? () => setSearching(true) : undefined}
        />
      )}
      <span className="flex flex-wrap items-center gap-x-2 gap-y-1 text-sm text-ink-soft">
        {shownFood && (
          <span>
            {foodHref ? (
              <a href={foodHref(shownFood.id)} target="_blank" rel="noreferrer" className="underline-offset-2 hover:underline">
                {sourceNote(shownFood)}
                <span className="sr-only"> (food details, opens in a new tab)</span>
              </a>
            ) : (
              sourceNote(shownFood)
            )}
          </span>
        )}
        {line.foodId !== undefined && <Badge>Your choice</Badge>}
        {checkMatch && analysed && (
          <Badge tone="honey" title={`Hearthswap is ${Math.round(analysed.confidence * 100)}% sure of this match`}>
            Check this match
            <span className="sr-only">: Hearthswap is {Math.round(analysed.confidence * 100)}% sure</span>
          </Badge>
        )}
        {analysed && !food && <Badge tone="beet">Not counted until a food is chosen</Badge>}
        {missingModifier && addFoodHref && (
          <a href={addFoodHref} className="font-semibold text-accent-strong underline-offset-2 hover:underline">
            Add the {missingModifier} one from its label
          </a>
        )}
      </span>
      {analysed?.role && food && onSetRole && (
        <LineRolePicker
          label={`What line ${number} does in the dish`}
          inferred={analysed.role}
          chosen={line.role}
          onChoose={(role) => onSetRole(line.key, role)}
        />
      )}
    </div>
  );
}

/** Every line of the recipe as the server read, matched and weighed it, with what the cook can change; a card per line on a phone. */
export function AnalysisLines({ lines, analysedLine, unitSystem, stale, totals, onSetGrams, onRemove, ...foodActions }: AnalysisLinesProps) {
  const rows: Row[] = lines.map((line, index) => ({ line, index, analysed: analysedLine(line.key) }));
  const figure = (value: (a: AnalyzedLine) => string) => (row: Row) => (
    <span className="font-bold whitespace-nowrap">{row.analysed ? value(row.analysed) : '…'}</span>
  );
  return (
    <div className={cx('transition-opacity', stale && 'opacity-80')}>
      <DataTable<Row>
        caption="Ingredient lines: amount read, food matched, weight, energy and protein"
        captionHidden
        density="snug"
        cardsBelow="md"
        tableClassName="text-base"
        rows={rows}
        rowKey={(row) => row.line.key}
        columns={[
          { key: 'ingredient', header: 'Ingredient', rowHeader: true, className: 'py-3 font-normal md:w-[24%]', cell: (row) => <IngredientCell {...row} /> },
          { key: 'amount', header: 'Amount', cardOrder: 3, className: 'py-3 md:w-[9%]', cell: (row) => <AmountCell {...row} /> },
          {
            key: 'food',
            header: 'Food',
            cardOrder: 2,
            cardWide: true,
            className: 'py-3 md:w-[31%]',
            cell: (row) => <FoodCell key={row.line.key} row={row} {...foodActions} />,
          },
          {
            key: 'weight',
            header: 'Weight',
            cardOrder: 4,
            className: 'py-3 md:w-[17%]',
            cell: (row) => (
              <>
                {needsAmount(row) && <span className="mb-1 block text-sm font-bold text-honey-800">Set an amount</span>}
                <LineGramsField
                  grams={row.line.grams ?? row.analysed?.grams ?? null}
                  label={`Grams of line ${row.index + 1}`}
                  unitSystem={unitSystem}
                  needsAmount={needsAmount(row)}
                  onCommit={(g) => onSetGrams(row.line.key, g)}
                />
                {row.line.grams !== undefined && (
                  <button
                    type="button"
                    onClick={() => onSetGrams(row.line.key, null)}
                    className="mt-1 text-sm font-semibold text-accent-strong underline-offset-2 hover:underline"
                  >
                    Use the recipe’s amount
                  </button>
                )}
              </>
            ),
          },
          { key: 'kcal', header: 'Energy', align: 'right', cardOrder: 5, className: 'py-3 md:w-[8%]', cell: figure((a) => formatKcal(a.nutrients.kcal)) },
          {
            key: 'protein',
            header: 'Protein',
            align: 'right',
            cardOrder: 6,
            className: 'py-3 md:w-[8%]',
            cell: figure((a) => formatMacroG(a.nutrients.proteinG)),
          },
          {
            key: 'remove',
            header: <span className="sr-only">Remove</span>,
            align: 'right',
            cardOrder: 7,
            cardWide: true,
            cardLabel: false,
            className: 'py-3 md:w-[2%]',
            cell: (row) => (
              <Button variant="quiet" size="sm" onClick={() => onRemove(row.line.key)} className="text-beet-700 max-md:px-0">
                <span aria-hidden="true" className="text-lg leading-none md:block">
                  ×
                </span>
                <span className="md:sr-only">Remove line {row.index + 1}</span>
              </Button>
            ),
          },
        ]}
        footer={
          totals
            ? [
                {
                  key: 'dish',
                  label: <span className="font-extrabold">Whole dish</span>,
                  className: 'bg-oat-100',
                  cells: {
                    weight: (
                      <>
                        <span className="block font-bold">{formatGrams(totals.grams)}</span>
                        {everydayWeight(totals.grams, unitSystem) && (
                          <span className="block text-sm text-ink-soft">{everydayWeight(totals.grams, unitSystem)}</span>
                        )}
                      </>
                    ),
                    kcal: <span className="font-bold whitespace-nowrap">{formatKcal(totals.kcal)}</span>,
                    protein: <span className="font-bold whitespace-nowrap">{formatNumber(totals.proteinG, 0)} g</span>,
                  },
                },
              ]
            : undefined
        }
      />
    </div>
  );
}
