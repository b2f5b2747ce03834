/**
 * The rewrite panel as a cook uses it (Testing Library, happy-dom), with fetch answered in the test:
 * targets suggested from the dish, the request it sends, the answer it shows, and a server message
 * put on the field it names. The figures are invented for the test.
 */
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Nutrients } from '../../shared/nutrition';
import type { AnalyzeResponse, FoodSummary } from '../../shared/schemas/analyze';
import type { RewriteRequest } from '../../shared/schemas/rewrite';
import { RewritePanel, type RewriteRecipe } from '../../src/features/rewrite/components/rewrite-panel';
import type { RewriteAnswer, RewritePlan } from '../../src/features/rewrite/rewrite-types';

const nutrients = (kcal: number, proteinG: number): Nutrients => ({ kcal, proteinG, fatG: 20, satFatG: 10, carbsG: 50, fiberG: 3, sugarG: 5, sodiumMg: 600 });
const RICOTTA: FoodSummary = { id: 3, source: 'usda-sr28', sourceId: '01036', name: 'Cheese, ricotta, whole milk' };
const PART_SKIM: FoodSummary = { id: 4, source: 'usda-sr28', sourceId: '01037', name: 'Cheese, ricotta, part skim milk' };
const PASTA: FoodSummary = { id: 5, source: 'usda-sr28', sourceId: '20120', name: 'Pasta, dry, enriched' };

const analysis: AnalyzeResponse = {
  servings: 4,
  lines: [
    {
      input: '2 cups whole milk ricotta',
      parsed: { quantity: 2, unit: 'cup', name: 'whole milk ricotta', comment: null },
      food: RICOTTA,
      alternatives: [],
      confidence: 1,
      grams: 496,
      volumeMl: 473,
      nutrients: nutrients(864, 56),
      warnings: [],
      portionUsed: '1 cup',
      checkMatch: false,
      missingModifier: null,
      pinned: { food: false, grams: false },
    },
    {
      input: '1 lb pasta',
      parsed: { quantity: 1, unit: 'lb', name: 'pasta', comment: null },
      food: PASTA,
      alternatives: [],
      confidence: 1,
      grams: 453.6,
      volumeMl: 900,
      nutrients: nutrients(1136, 24),
      warnings: [],
      portionUsed: null,
      checkMatch: false,
      missingModifier: null,
      pinned: { food: false, grams: false },
    },
  ],
  totals: nutrients(2000, 80),
  perServing: nutrients(500, 20),
  totalGrams: 949.6,
  volumeMl: 1373,
};

const recipe: RewriteRecipe = { lines: analysis.lines.map((l) => ({ input: l.input })), servings: 4, analysis, updating: false };

const plan = (perServing: Nutrients, food: FoodSummary): RewritePlan => ({
  lines: [
    { index: 0, food, grams: 496, volumeMl: 473, nutrients: perServing },
    { index: 1, food: PASTA, grams: 453.6, volumeMl: 900, nutrients: nutrients(1136, 24) },
  ],
  totals: { ...perServing, kcal: perServing.kcal * 4, proteinG: perServing.proteinG * 4 },
  perServing,
  volumeMl: 1373,
});

const answer: RewriteAnswer = {
  status: 'optimal',
  before: plan(nutrients(500, 20), RICOTTA),
  after: plan(nutrients(395, 27), PART_SKIM),
  changes: [
    {
      line: 0,
      from: RICOTTA,
      to: PART_SKIM,
      gramsBefore: 496,
      gramsAfter: 496,
      swapped: true,
      serves: ['kcalMax', 'proteinMinG'],
      reason: 'Part-skim ricotta keeps the creamy layer with less fat',
    },
  ],
  skippedLines: [],
  solver: { objective: 'closest', objectiveValue: 1, ms: 12, solves: 1, provenOptimal: true },
};

type Reply = { status: number; body: unknown };
let rewriteReply: Reply;
let sent: RewriteRequest[];

function json(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

beforeEach(() => {
  sent = [];
  rewriteReply = { status: 200, body: answer };
  vi.stubGlobal(
    'fetch',
    vi.fn(async (path: string, init?: RequestInit) => {
      if (path === '/api/auth/csrf') return json(200, { token: 'test-token' });
      if (path === '/api/rewrite' && init?.method === 'POST') {
        sent.push(JSON.parse(String(init.body)) as RewriteRequest);
        return json(rewriteReply.status, rewriteReply.body);
      }
      return json(404, { error: { code: 'not_found', message: `No ${path} in this test.` } });
    }),
  );
});
afterEach(() => vi.unstubAllGlobals());

function renderPanel(props: { recipe: RewriteRecipe | null }) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(
    <MemoryRouter>
      <QueryClientProvider client={client}>
        <RewritePanel recipe={props.recipe} unitSystem="us" signedIn={false} saveAction={{ kind: 'sign-in', signInHref: '/sign-in', signUpHref: '/sign-up' }} />
      </QueryClientProvider>
    </MemoryRouter>,
  );
}

describe('RewritePanel', () => {
  it('shows nothing before anything is analysed', () => {
    const { container } = renderPanel({ recipe: null });
    expect(container.textContent).toBe('');
  });

  it('suggests 30 % more protein (rounded up) and 20 % fewer calories (down to 5 kcal) than the dish', () => {
    renderPanel({ recipe });
    // 20 g × 1.3 = 26 g; 500 kcal × 0.8 = 400 kcal
    expect(screen.getByLabelText(/Protein, at least/)).toHaveProperty('value', '26');
    expect(screen.getByLabelText(/Calories, at most/)).toHaveProperty('value', '400');
  });

  it('sends the lines and targets, then shows the lighter version and its swap', async () => {
    const user = userEvent.setup();
    renderPanel({ recipe });
    await user.click(screen.getByRole('button', { name: /rewrite/i }));

    const result = await screen.findByRole('region', { name: 'The lighter version' });
    expect(sent).toHaveLength(1);
    expect(sent[0]).toMatchObject({
      lines: [{ input: '2 cups whole milk ricotta' }, { input: '1 lb pasta' }],
      servings: 4,
      targets: { proteinMinG: 26, kcalMax: 400 },
      volumeTolerancePct: 10,
      objective: 'closest',
    });
    expect(await within(result).findByText(/Part-skim ricotta keeps the creamy layer/)).toBeTruthy();
    expect(within(result).getAllByText(/Cheese, ricotta, part skim milk/).length).toBeGreaterThan(0);
  });

  it('puts a message from the server on the field it names', async () => {
    rewriteReply = {
      status: 400,
      body: {
        error: {
          code: 'invalid_input',
          message: 'kcalMax: too low.',
          details: { fieldErrors: { 'targets.kcalMax': ['The calorie ceiling is too low for this dish.'] } },
        },
      },
    };
    const user = userEvent.setup();
    renderPanel({ recipe });
    await user.click(screen.getByRole('button', { name: /rewrite/i }));
    expect(await screen.findByText('The calorie ceiling is too low for this dish.')).toBeTruthy();
    expect(screen.getByLabelText(/Calories, at most/).getAttribute('aria-invalid')).toBe('true');
  });
});
