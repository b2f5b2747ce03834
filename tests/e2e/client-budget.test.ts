/**
 * The built client's first-visit JavaScript per page, from Vite's manifest (deterministic, no timing):
 * at most 200 KB compressed for any page (issue 13's phone-profile budget), and the chart library
 * only where a chart is drawn (it loads on demand inside the rewrite result).
 */
import { describe, expect, it } from 'vitest';
import { existsSync } from 'node:fs';
import { chartFiles, firstVisitBudgets } from '../helpers/client-budget';

const BUDGET_BYTES = 200 * 1024;

describe('client bundle budget', () => {
  it('has a build to measure (npm test builds it)', () => {
    expect(existsSync('dist/client/.vite/manifest.json')).toBe(true);
  });

  it('loads at most 200 KB of compressed JavaScript on a first visit of any page, even as gzip', () => {
    const budgets = firstVisitBudgets();
    expect(budgets.length).toBeGreaterThan(15);
    for (const page of budgets) {
      expect(page.gzipBytes, `${page.module}: ${page.files.join(', ')}`).toBeLessThanOrEqual(BUDGET_BYTES);
      expect(page.brotliBytes, page.module).toBeLessThanOrEqual(page.gzipBytes);
    }
  });

  it('keeps the chart library out of every page’s first visit', () => {
    const chart = chartFiles();
    expect(chart.length).toBeGreaterThan(0);
    for (const page of firstVisitBudgets()) {
      for (const file of chart) expect(page.files, page.module).not.toContain(file);
    }
  });
});
