import { formatKcal, formatMacroG, formatProteinDensity } from '../../lib/format';

/** Energy and protein per 100 g, with the protein density that judges a lean swap. */
export function FoodFigures({ kcalPer100g, proteinPer100g, showDensity = false }: { kcalPer100g: number; proteinPer100g: number; showDensity?: boolean }) {
  const density = kcalPer100g > 0 ? (proteinPer100g * 100) / kcalPer100g : null;
  return (
    <span className="tabular-nums">
      {formatKcal(kcalPer100g)} · {formatMacroG(proteinPer100g)} protein <span className="text-ink-soft">per 100 g</span>
      {showDensity && density !== null && <span className="text-ink-soft"> · {formatProteinDensity(density)}</span>}
    </span>
  );
}
