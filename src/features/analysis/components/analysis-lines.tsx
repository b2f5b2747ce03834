import { useEffect, useRef, useState, type ReactNode } from 'react';
import type { AnalyzedLine, FoodSummary } from '../../../../shared/schemas/analyze';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
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

// On phones each row is a card: the ingredient and its food across the top, figures in two columns.
const CELL = 'px-3 py-3 align-top max-md:block max-md:p-0';
const PHONE_LABEL = 'mb-0.5 block text-xs font-bold tracking-wide text-ink-soft uppercase md:sr-only';

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

function LineRow({
  line,
  index,
  analysed,
  unitSystem,
  onChooseFood,
  onSetGrams,
  onSetRole,
  onRemove,
  renderFoodSearch,
  foodHref,
  addFoodHref,
}: Omit<AnalysisLinesProps, 'lines' | 'analysedLine' | 'stale' | 'totals'> & { line: KitchenLine; index: number; analysed: AnalyzedLine | null }) {
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
  const amount = analysed ? formatParsedAmount(analysed.parsed) : null;
  // A line with no food needs a food first, unless it also gave no amount ("salt to taste").
  const needsAmount = Boolean(analysed && analysed.grams === 0 && line.grams === undefined && (analysed.food !== null || analysed.parsed.quantity === null));
  const checkMatch = Boolean(food && analysed && !analysed.pinned.food && (analysed.checkMatch || analysed.confidence < CHECK_MATCH_BELOW));
  const missingModifier = analysed && !analysed.pinned.food ? analysed.missingModifier : null;
  const grams = line.grams ?? analysed?.grams ?? null;

  function choose(next: FoodSummary | null) {
    if (next) setPicked((list) => [next, ...list.filter((p) => p.id !== next.id)].slice(0, 5));
    onChooseFood(line.key, next);
  }

  return (
    <tr className="border-b border-line last:border-b-0 max-md:grid max-md:grid-cols-2 max-md:gap-x-4 max-md:gap-y-3 max-md:rounded-card max-md:border max-md:bg-surface max-md:p-4 max-md:shadow-card md:even:bg-oat-50/60">
      <th scope="row" className={cx(CELL, 'text-left font-normal max-md:col-span-2 md:w-[24%]')}>
        <span className="flex items-start gap-2">
          <span aria-hidden="true" className="mt-0.5 font-bold text-oat-500 tabular-nums">
            {number}.
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
      </th>

      <td className={cx(CELL, 'max-md:order-3 md:w-[9%]')}>
        <span className={PHONE_LABEL}>Amount</span>
        {analysed ? (
          <span className="flex flex-col">
            <span className="font-semibold tabular-nums">{amount ?? <span className="text-ink-soft">none given</span>}</span>
            {analysed.portionUsed && <span className="text-sm text-ink-soft">by USDA’s weight for {measureWords(analysed.portionUsed)}</span>}
          </span>
        ) : (
          <span className="text-ink-soft">…</span>
        )}
      </td>

      <td className={cx(CELL, 'max-md:order-2 max-md:col-span-2 md:w-[31%]')}>
        <span className={PHONE_LABEL}>Food</span>
        {analysed || line.foodId !== undefined ? (
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
        ) : (
          <span className="inline-flex items-center gap-2 text-ink-soft">
            <Spinner className="size-4" /> Matching…
          </span>
        )}
      </td>

      <td className={cx(CELL, 'max-md:order-4 md:w-[17%]')}>
        <span className={PHONE_LABEL}>Weight</span>
        {needsAmount && <span className="mb-1 block text-sm font-bold text-honey-800">Set an amount</span>}
        <LineGramsField
          grams={grams}
          label={`Grams of line ${number}`}
          unitSystem={unitSystem}
          needsAmount={needsAmount}
          onCommit={(g) => onSetGrams(line.key, g)}
        />
        {line.grams !== undefined && (
          <button
            type="button"
            onClick={() => onSetGrams(line.key, null)}
            className="mt-1 text-sm font-semibold text-accent-strong underline-offset-2 hover:underline"
          >
            Use the recipe’s amount
          </button>
        )}
      </td>

      <td className={cx(CELL, 'text-right tabular-nums max-md:order-5 max-md:text-left md:w-[8%]')}>
        <span className={PHONE_LABEL}>Energy</span>
        <span className="font-bold whitespace-nowrap">{analysed ? formatKcal(analysed.nutrients.kcal) : '…'}</span>
      </td>
      <td className={cx(CELL, 'text-right tabular-nums max-md:order-6 max-md:text-left md:w-[8%]')}>
        <span className={PHONE_LABEL}>Protein</span>
        <span className="font-bold whitespace-nowrap">{analysed ? formatMacroG(analysed.nutrients.proteinG) : '…'}</span>
      </td>
      <td className={cx(CELL, 'text-right max-md:order-7 max-md:col-span-2 md:w-[2%]')}>
        <Button variant="quiet" size="sm" onClick={() => onRemove(line.key)} className="text-beet-700 max-md:px-0">
          <span aria-hidden="true" className="text-lg leading-none md:block">
            ×
          </span>
          <span className="md:sr-only">Remove line {number}</span>
        </Button>
      </td>
    </tr>
  );
}

/** Every line of the recipe as the server read, matched and weighed it, with what the cook can change. */
export function AnalysisLines({ lines, analysedLine, unitSystem, stale, totals, ...actions }: AnalysisLinesProps) {
  return (
    <div className={cx('transition-opacity', stale && 'opacity-80')}>
      <table className="w-full border-collapse text-base max-md:block md:overflow-hidden md:rounded-card md:border md:border-line md:bg-surface">
        <caption className="sr-only">Ingredient lines: amount read, food matched, weight, energy and protein</caption>
        <thead className="max-md:hidden">
          <tr className="border-b border-line bg-oat-100 text-sm">
            <th scope="col" className="px-3 py-2.5 text-left font-bold">
              Ingredient
            </th>
            <th scope="col" className="px-3 py-2.5 text-left font-bold">
              Amount
            </th>
            <th scope="col" className="px-3 py-2.5 text-left font-bold">
              Food
            </th>
            <th scope="col" className="px-3 py-2.5 text-left font-bold">
              Weight
            </th>
            <th scope="col" className="px-3 py-2.5 text-right font-bold">
              Energy
            </th>
            <th scope="col" className="px-3 py-2.5 text-right font-bold">
              Protein
            </th>
            <th scope="col" className="px-3 py-2.5">
              <span className="sr-only">Remove</span>
            </th>
          </tr>
        </thead>
        <tbody className="max-md:flex max-md:flex-col max-md:gap-3">
          {lines.map((line, index) => (
            <LineRow key={line.key} line={line} index={index} analysed={analysedLine(line.key)} unitSystem={unitSystem} {...actions} />
          ))}
        </tbody>
        {totals && (
          <tfoot className="border-t-2 border-line-strong bg-oat-100 max-md:mt-3 max-md:block max-md:rounded-card max-md:border-2 max-md:p-4">
            <tr className="max-md:grid max-md:grid-cols-3 max-md:gap-3">
              <th scope="row" colSpan={3} className="px-3 py-3 text-left font-extrabold max-md:col-span-3 max-md:block max-md:p-0">
                Whole dish
              </th>
              <td className="px-3 py-3 tabular-nums max-md:block max-md:p-0">
                <span className={PHONE_LABEL}>Weight</span>
                <span className="block font-bold">{formatGrams(totals.grams)}</span>
                {everydayWeight(totals.grams, unitSystem) && <span className="block text-sm text-ink-soft">{everydayWeight(totals.grams, unitSystem)}</span>}
              </td>
              <td className="px-3 py-3 text-right font-bold whitespace-nowrap tabular-nums max-md:block max-md:p-0 max-md:text-left">
                <span className={PHONE_LABEL}>Energy</span>
                {formatKcal(totals.kcal)}
              </td>
              <td className="px-3 py-3 text-right font-bold whitespace-nowrap tabular-nums max-md:block max-md:p-0 max-md:text-left">
                <span className={PHONE_LABEL}>Protein</span>
                {formatNumber(totals.proteinG, 0)} g
              </td>
              <td className="max-md:hidden" />
            </tr>
          </tfoot>
        )}
      </table>
    </div>
  );
}
