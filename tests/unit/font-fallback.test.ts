import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { fromFile } from '@capsizecss/unpack/fs';
import { ARIAL, nunitoFallbacks } from '../../scripts/font-fallback-metrics';

const css = readFileSync('src/styles/index.css', 'utf8');

/** The `Nunito Fallback` @font-face blocks of the style sheet, by their lowest weight. */
function fallbackFaces() {
  const faces = [...css.matchAll(/@font-face\s*\{([^}]*)\}/g)].map((m) => m[1]).filter((body) => /font-family:\s*'Nunito Fallback'/.test(body));
  const read = (body: string, name: string) => new RegExp(`${name}:\\s*([^;]+);`).exec(body)?.[1].trim();
  return faces.map((body) => ({
    weight: read(body, 'font-weight'),
    src: read(body, 'src'),
    descriptors: {
      sizeAdjust: read(body, 'size-adjust'),
      ascentOverride: read(body, 'ascent-override'),
      descentOverride: read(body, 'descent-override'),
      lineGapOverride: read(body, 'line-gap-override'),
    },
  }));
}

describe('the fallback face drawn until Nunito arrives', () => {
  it('is named right after Nunito in the font stack', () => {
    expect(css).toMatch(/--font-sans:\s*'Nunito',\s*'Nunito Fallback',/);
  });

  it('carries the size-adjust and overrides computed from the Nunito files (regular up to 500, bold above)', async () => {
    const want = await nunitoFallbacks();
    const faces = fallbackFaces();
    expect(faces.map((f) => f.weight)).toEqual(['100 500', '600 1000']);
    expect(faces[0].descriptors).toEqual(want.regular);
    expect(faces[1].descriptors).toEqual(want.bold);
    // a bigger Nunito than Arial by average width, with Nunito's taller ascent (1011/1000 em)
    expect(parseFloat(want.regular.sizeAdjust)).toBeGreaterThan(100);
  });

  it('names local Arial and its metric twin Liberation Sans, in the matching weight', () => {
    const [regular, bold] = fallbackFaces();
    expect(regular.src).toContain("local('Liberation Sans')");
    expect(regular.src).toContain("local('Arial')");
    expect(bold.src).toContain("local('Liberation Sans Bold')");
    expect(bold.src).toContain("local('Arial Bold')");
  });

  it("scales from Arial's metrics as Liberation Sans (Debian fonts-liberation, Arial-metric) measures them", async () => {
    for (const [face, file] of [
      ['regular', 'LiberationSans-Regular.ttf'],
      ['bold', 'LiberationSans-Bold.ttf'],
    ] as const) {
      const m = await fromFile(`/usr/share/fonts/truetype/liberation/${file}`);
      expect({ unitsPerEm: m.unitsPerEm, ascent: m.ascent, descent: m.descent, lineGap: m.lineGap, xWidthAvg: m.xWidthAvg }).toEqual(ARIAL[face]);
    }
  });
});
