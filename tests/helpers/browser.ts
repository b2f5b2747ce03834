import { chromium, type Browser, type Page } from 'playwright-core';
import { mkdirSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

export const SCREENSHOT_DIR = path.resolve('test-results/screenshots');

const ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-quic',
  '--no-first-run',
  '--disable-component-update',
  '--disable-sync',
];

function launch(args: string[] = [], ignoreDefaultArgs: string[] = []) {
  return chromium.launch({ executablePath: '/usr/bin/chromium', headless: true, args: [...ARGS, ...args], ignoreDefaultArgs });
}

/** The `--disable-features=…` switch Playwright gave the Chromium this process started (read from /proc). */
function playwrightDisableFeatures(): string | undefined {
  for (const pid of readdirSync('/proc').filter((d) => /^\d+$/.test(d))) {
    try {
      const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
      if (Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]) !== process.pid) continue;
      const switches = readFileSync(`/proc/${pid}/cmdline`, 'utf8').split('\0');
      const found = switches.find((a) => a.startsWith('--disable-features='));
      if (found && switches[0].includes('chromium')) return found;
    } catch {
      // the process ended while we looked
    }
  }
  return undefined;
}

/**
 * Debian's Chromium, headless; never a downloaded browser. `disableFeatures` are added to the features
 * Playwright already turns off: Chromium reads only the last `--disable-features`, so the two lists go
 * out as one (Playwright's own list is read from a first, throwaway launch).
 */
export async function launchBrowser(options: { disableFeatures?: string[] } = {}): Promise<Browser> {
  if (!options.disableFeatures?.length) return launch();
  const probe = await launch();
  const defaults = playwrightDisableFeatures();
  await probe.close();
  if (!defaults) throw new Error("could not read Playwright's --disable-features from the launched Chromium");
  return launch([`${defaults},${options.disableFeatures.join(',')}`], [defaults]);
}

export async function screenshot(page: Page, name: string) {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const file = path.join(SCREENSHOT_DIR, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
