import { chromium } from 'playwright-core';
import sharp from 'sharp';
import { PANELS, panelHtml } from './tests/helpers/label-panels';
import { readLabelPhoto, closeLabelReader } from './server/services/label-reader';
const which = process.argv.slice(2).map(Number);
const b = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking'] });
for (const [i, p] of PANELS.entries()) {
  if (which.length && !which.includes(i + 1)) continue;
  const page = await b.newPage({ deviceScaleFactor: 2, viewport: { width: 1100, height: 900 } });
  await page.setContent(panelHtml(p));
  const jpeg = await sharp(await page.locator('body').screenshot()).jpeg({ quality: 88 }).toBuffer();
  await page.close();
  try {
    const r = await readLabelPhoto(jpeg);
    const wrong = Object.entries(p.expected).filter(([k, v]) => (r.fields as Record<string, unknown>)[k] !== v);
    console.log(i + 1, p.layout, wrong.length ? wrong.map(([k, v]) => `${k} ${(r.fields as Record<string, unknown>)[k]}≠${v}`).join(', ') : 'EXACT');
    if (wrong.length) console.log(r.text);
  } catch (e) { console.log(i + 1, 'ERR', (e as Error).message, JSON.stringify((e as { details?: unknown }).details)?.slice(0, 1500)); }
}
await b.close();
await closeLabelReader();
