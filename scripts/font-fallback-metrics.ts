/**
 * The `Nunito Fallback` faces in src/styles/index.css: a local Arial scaled to Nunito's metrics, so the
 * text drawn before Nunito arrives wraps and stands like Nunito and the swap moves nothing (the
 * size-adjust / ascent-override technique, as the capsize font-metrics project computes it).
 * `npx tsx scripts/font-fallback-metrics.ts` prints the descriptors from the font files;
 * tests/unit/font-fallback.test.ts checks that the style sheet carries them.
 */
import { createRequire } from 'node:module';
import { fromFile } from '@capsizecss/unpack/fs';

/** The metrics the fallback is scaled from: unitsPerEm, ascent, descent, lineGap, and the Latin average width. */
export interface FaceMetrics {
  unitsPerEm: number;
  ascent: number;
  descent: number;
  lineGap: number;
  xWidthAvg: number;
}

/**
 * Arial's metrics, read with @capsizecss/unpack from Liberation Sans 2 (/usr/share/fonts/truetype/liberation,
 * Debian's fonts-liberation), which is drawn to Arial's metrics glyph for glyph: Chromium on Linux finds it
 * under local('Liberation Sans') where no Arial is installed. xWidthAvg is capsize's letter-frequency
 * weighted average of the Latin letters.
 */
export const ARIAL: Record<'regular' | 'bold', FaceMetrics> = {
  regular: { unitsPerEm: 2048, ascent: 1854, descent: -434, lineGap: 67, xWidthAvg: 913 },
  bold: { unitsPerEm: 2048, ascent: 1854, descent: -434, lineGap: 67, xWidthAvg: 983 },
};

/** Nunito's faces the fallback stands in for: the regular for weights up to 500, the bold above. */
export const NUNITO_FILES = { regular: '@fontsource/nunito/files/nunito-latin-400-normal.woff', bold: '@fontsource/nunito/files/nunito-latin-700-normal.woff' };

export interface FallbackDescriptors {
  sizeAdjust: string;
  ascentOverride: string;
  descentOverride: string;
  lineGapOverride: string;
}

const percent = (x: number) => `${(x * 100).toFixed(2)}%`;

/** The descriptors that make `fallback` take `font`'s average width and line metrics. */
export function fallbackDescriptors(font: FaceMetrics, fallback: FaceMetrics): FallbackDescriptors {
  const sizeAdjust = font.xWidthAvg / font.unitsPerEm / (fallback.xWidthAvg / fallback.unitsPerEm);
  const scaled = (v: number) => percent(Math.abs(v) / font.unitsPerEm / sizeAdjust);
  return { sizeAdjust: percent(sizeAdjust), ascentOverride: scaled(font.ascent), descentOverride: scaled(font.descent), lineGapOverride: scaled(font.lineGap) };
}

/** The descriptors for both fallback faces, from the Nunito files in node_modules. */
export async function nunitoFallbacks(): Promise<Record<'regular' | 'bold', FallbackDescriptors>> {
  const require = createRequire(import.meta.url);
  const [regular, bold] = await Promise.all([fromFile(require.resolve(NUNITO_FILES.regular)), fromFile(require.resolve(NUNITO_FILES.bold))]);
  return { regular: fallbackDescriptors(regular, ARIAL.regular), bold: fallbackDescriptors(bold, ARIAL.bold) };
}

if (import.meta.url === `file://${process.argv[1]}`) console.log(await nunitoFallbacks());
