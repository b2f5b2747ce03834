/**
 * OCR of Nutrition Facts panels rendered in Chromium (invented products, tests/helpers/label-panels.ts),
 * posted as photos to POST /api/foods/label-scan: every value must read back exactly on at least 9 of
 * the 10 panels. The first five tuned the reader; the last five are held out and reported apart.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import { launchBrowser } from '../helpers/browser';
import { PANELS, panelHtml, type PanelSpec } from '../helpers/label-panels';
import { createTestApp, signUp, type TestApp } from '../helpers/test-app';

const OUT = path.resolve('test-results/label-panels');

let t: TestApp;
let browser: Browser;
beforeAll(async () => {
  t = await createTestApp();
  browser = await launchBrowser();
  mkdirSync(OUT, { recursive: true });
});
afterAll(async () => {
  await browser?.close();
  await t?.close();
});

async function photograph(panel: PanelSpec, index: number): Promise<Buffer> {
  const page = await browser.newPage({ deviceScaleFactor: 2, viewport: { width: 1100, height: 900 } });
  try {
    await page.setContent(panelHtml(panel));
    // a phone photo is a JPEG of the panel with some room around it
    const png = await page.locator('body').screenshot();
    const jpeg = await sharp(png).jpeg({ quality: 88 }).toBuffer();
    writeFileSync(path.join(OUT, `${String(index + 1).padStart(2, '0')}-${panel.layout}.jpg`), jpeg);
    return jpeg;
  } finally {
    await page.close();
  }
}

describe('reading label photos', () => {
  it('reads every value exactly on at least 9 of 10 panels', { timeout: 600_000 }, async () => {
    const cook = await signUp(t.app, 'cook');
    const exact: boolean[] = [];
    const misses: string[] = [];
    for (const [i, panel] of PANELS.entries()) {
      const photo = await photograph(panel, i);
      const res = await cook.agent.post('/api/foods/label-scan').set('X-CSRF-Token', cook.csrf).attach('image', photo, `panel-${i + 1}.jpg`);
      expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(200);
      const wrong = Object.entries(panel.expected).filter(([k, v]) => res.body.fields[k] !== v);
      exact.push(wrong.length === 0);
      if (wrong.length) misses.push(`${i + 1} ${panel.product}: ${wrong.map(([k, v]) => `${k} ${JSON.stringify(res.body.fields[k])}≠${JSON.stringify(v)}`).join(', ')}`);
      expect(res.body.confidence).toBeGreaterThan(0);
    }
    const tuned = exact.slice(0, 5).filter(Boolean).length;
    const heldOut = exact.slice(5).filter(Boolean).length;
    console.log(`label OCR: tuned panels ${tuned}/5 exact, held-out panels ${heldOut}/5 exact${misses.length ? `\n${misses.join('\n')}` : ''}`);
    expect(tuned + heldOut, misses.join('\n')).toBeGreaterThanOrEqual(9);
  });

  it('answers a photo that is not a label clearly, never with a 500', { timeout: 120_000 }, async () => {
    const cook = await signUp(t.app, 'cook');
    const page = await browser.newPage({ deviceScaleFactor: 2 });
    await page.setContent('<body style="font:28px serif;padding:40px">Grandma\'s Sunday casserole<br>Preheat the oven and butter a deep dish.</body>');
    const notLabel = await page.screenshot();
    await page.close();
    const res = await cook.agent.post('/api/foods/label-scan').set('X-CSRF-Token', cook.csrf).attach('image', notLabel, 'card.png').expect(422);
    expect(res.body.error.message).toMatch(/No Nutrition Facts panel/);
    const truncated = (await sharp({ create: { width: 800, height: 600, channels: 3, background: '#fff' } }).jpeg().toBuffer()).subarray(0, 300);
    const broken = await cook.agent.post('/api/foods/label-scan').set('X-CSRF-Token', cook.csrf).attach('image', truncated, 'broken.jpg');
    expect([400, 422]).toContain(broken.status);
    expect(broken.body.error.message.length).toBeGreaterThan(10);
  });
});
