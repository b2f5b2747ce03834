import { describe, expect, it } from 'vitest';
import { ROLES } from '../../../shared/food';
import type { Swap } from '../../../shared/schemas/swaps';
import { emptyLabelFood, labelFoodInput } from '../../../src/features/swaps/label-food-form';
import { draftFromSwap, emptySwapDraft, swapDraftErrorsFrom, swapRequestFromDraft } from '../../../src/features/swaps/swap-draft';
import { filterSwaps, hasSwapFilters, NO_SWAP_FILTERS, rolesInUse } from '../../../src/features/swaps/swap-filters';
import { parseTags, swapFromWords, volumeRatioWords } from '../../../src/lib/swap-words';

const label = (role: string) => (role === 'melting-cheese' ? 'Melting cheese' : role);

function swap(over: Partial<Swap>): Swap {
  return {
    id: 1,
    coachId: 9,
    fromFood: null,
    fromRole: null,
    toFood: { id: 20, source: 'usda-sr28', sourceId: '01028', name: 'Cheese, mozzarella, part skim milk', kcalPer100g: 254, proteinPer100g: 24.26 },
    volumeRatio: 1,
    note: '',
    tags: [],
    status: 'draft',
    updatedAt: '2026-01-01T00:00:00.000Z',
    ...over,
  };
}

const library: Swap[] = [
  swap({ id: 1, fromRole: 'melting-cheese', note: 'Bake 5 minutes longer for melt', tags: ['Pizza night'], status: 'published' }),
  swap({
    id: 2,
    fromFood: { id: 3, source: 'usda-sr28', sourceId: '01036', name: 'Cheese, ricotta, whole milk' },
    note: 'Blend smooth first',
    tags: ['bakes'],
  }),
  swap({ id: 3, fromRole: 'cream', note: 'Crème légère stirs in off the heat', status: 'published' }),
];

describe('filterSwaps', () => {
  it('passes everything with no filters', () => {
    expect(filterSwaps(library, NO_SWAP_FILTERS, label).map((s) => s.id)).toEqual([1, 2, 3]);
    expect(hasSwapFilters(NO_SWAP_FILTERS)).toBe(false);
  });
  it('filters by status and role together', () => {
    expect(filterSwaps(library, { ...NO_SWAP_FILTERS, status: 'published' }, label).map((s) => s.id)).toEqual([1, 3]);
    expect(filterSwaps(library, { ...NO_SWAP_FILTERS, status: 'draft', role: 'melting-cheese' }, label)).toEqual([]);
  });
  it('matches every word of the text anywhere, ignoring case and accents', () => {
    expect(filterSwaps(library, { ...NO_SWAP_FILTERS, text: 'pizza MELT' }, label).map((s) => s.id)).toEqual([1]);
    expect(filterSwaps(library, { ...NO_SWAP_FILTERS, text: 'creme legere' }, label).map((s) => s.id)).toEqual([3]);
    expect(filterSwaps(library, { ...NO_SWAP_FILTERS, text: 'ricotta smooth' }, label).map((s) => s.id)).toEqual([2]);
    // the role in words counts as text too
    expect(filterSwaps(library, { ...NO_SWAP_FILTERS, text: 'melting cheese' }, label).map((s) => s.id)).toEqual([1]);
  });
  it('lists the roles in use in ROLES order', () => {
    expect(rolesInUse(library, ROLES)).toEqual(['melting-cheese', 'cream']);
  });
});

describe('swap words', () => {
  it('names what a swap replaces', () => {
    expect(swapFromWords(library[0], label)).toBe('Any melting cheese');
    expect(swapFromWords(library[1], label)).toBe('Cheese, ricotta, whole milk');
  });
  it('says the volume change in percent', () => {
    expect(volumeRatioWords(1)).toBe('Same volume');
    expect(volumeRatioWords(1.25)).toBe('25% more by volume');
    expect(volumeRatioWords(0.8)).toBe('20% less by volume');
  });
  it('reads comma-separated tags without blanks or repeats', () => {
    expect(parseTags(' high-protein, , Bakes,bakes ,  pizza   night ')).toEqual(['high-protein', 'Bakes', 'pizza night']);
    expect(parseTags('')).toEqual([]);
  });
});

describe('swapRequestFromDraft', () => {
  const mozzarella = { id: 26, name: 'Cheese, mozzarella, whole milk' };
  const light = { id: 8633, name: 'Cheese, mozzarella, nonfat' };

  it('asks for what is missing', () => {
    const result = swapRequestFromDraft(emptySwapDraft(), { isNew: true });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors).sort()).toEqual(['fromFood', 'toFood']);
    const role = swapRequestFromDraft({ ...emptySwapDraft(), fromKind: 'role', fromRole: 'not-a-role', toFood: light }, { isNew: true });
    expect(role.ok === false && role.errors.fromRole).toBeTruthy();
  });
  it('refuses a swap to the same food and ratios outside (0, 4]', () => {
    const same = swapRequestFromDraft({ ...emptySwapDraft(), fromFood: light, toFood: light }, { isNew: true });
    expect(same.ok === false && same.errors.toFood).toBeTruthy();
    for (const bad of ['0', '-1', '4.5', 'lots']) {
      const r = swapRequestFromDraft({ ...emptySwapDraft(), fromFood: mozzarella, toFood: light, volumeRatio: bad }, { isNew: true });
      expect(r.ok === false && r.errors.volumeRatio, bad).toBeTruthy();
    }
  });
  it('builds a food swap, sending status only for a new one', () => {
    const draft = {
      ...emptySwapDraft(),
      fromFood: mozzarella,
      toFood: light,
      volumeRatio: '1,25',
      note: '  Bake 5 minutes longer  ',
      tags: 'a, b',
      publishNow: true,
    };
    const created = swapRequestFromDraft(draft, { isNew: true });
    expect(created).toEqual({
      ok: true,
      request: { fromFoodId: 26, fromRole: null, toFoodId: 8633, volumeRatio: 1.25, note: 'Bake 5 minutes longer', tags: ['a', 'b'], status: 'published' },
    });
    const edited = swapRequestFromDraft(draft, { isNew: false });
    expect(edited.ok && 'status' in edited.request).toBe(false);
  });
  it('builds a role swap without the food chosen before switching', () => {
    const r = swapRequestFromDraft(
      { ...emptySwapDraft(), fromKind: 'role', fromRole: 'melting-cheese', fromFood: mozzarella, toFood: light },
      { isNew: false },
    );
    expect(r.ok && r.request.fromFoodId).toBe(null);
    expect(r.ok && r.request.fromRole).toBe('melting-cheese');
  });
  it('round-trips a saved swap through the form', () => {
    const saved = library[0];
    const r = swapRequestFromDraft(draftFromSwap(saved), { isNew: false });
    expect(r).toEqual({
      ok: true,
      request: { fromFoodId: null, fromRole: 'melting-cheese', toFoodId: 20, volumeRatio: 1, note: saved.note, tags: saved.tags },
    });
  });
  it('puts the server field messages under the form fields', () => {
    expect(swapDraftErrorsFrom({ toFoodId: 'Unknown food.', fromFoodId: 'Give either fromFoodId or fromRole.' }, 'role')).toEqual({
      toFood: 'Unknown food.',
      fromRole: 'Give either fromFoodId or fromRole.',
    });
  });
});

describe('labelFoodInput', () => {
  const filled = { ...emptyLabelFood(), name: '  Light  melting shreds ', servingSizeG: '28', proteinG: '8', fatG: '3', carbsG: '1' };

  it('reads a label typed with thousands and decimal commas', () => {
    const r = labelFoodInput({ ...filled, sodiumMg: '1 000', proteinG: '8,5' });
    expect(r.ok && r.input.sodiumMg).toBe(1000);
    expect(r.ok && r.input.proteinG).toBe(8.5);
  });
  it('sends only what the label gave, leaving energy to the server when blank', () => {
    const r = labelFoodInput(filled);
    expect(r).toEqual({ ok: true, input: { name: 'Light melting shreds', servingSizeG: 28, proteinG: 8, fatG: 3, carbsG: 1 } });
    const withRole = labelFoodInput({ ...filled, kcal: '70', servingSizeMl: '60', role: 'melting-cheese' });
    expect(withRole.ok && withRole.input).toMatchObject({ kcal: 70, servingSizeMl: 60, roles: ['melting-cheese'] });
  });
  it('asks for a serving size and the three macronutrients', () => {
    const r = labelFoodInput({ ...emptyLabelFood(), name: 'Oat crumb' });
    expect(r.ok === false && Object.keys(r.errors).sort()).toEqual(['carbsG', 'fatG', 'proteinG', 'servingSizeG']);
  });
  it('refuses parts larger than their whole', () => {
    const r = labelFoodInput({ ...filled, satFatG: '4', sugarG: '2' });
    expect(r.ok === false && Object.keys(r.errors).sort()).toEqual(['satFatG', 'sugarG']);
  });
});
