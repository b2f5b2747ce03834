import { describe, expect, it } from 'vitest';
import { suggestionFields } from '../../../src/features/rewrite/rewrite-form';

describe('one-click suggestions fill the targets form', () => {
  it('the form takes every target a combined suggestion moves', () => {
    const fields = suggestionFields({ kind: 'targets', value: 2, targets: { proteinMinG: 35, kcalMax: 282 }, message: '' });
    expect(fields).toEqual([
      { name: 'targets.proteinMinG', value: '35' },
      { name: 'targets.kcalMax', value: '282' },
    ]);
    expect(suggestionFields({ kind: 'target', target: 'kcalMax', value: 300, message: '' })).toEqual([{ name: 'targets.kcalMax', value: '300' }]);
    expect(suggestionFields({ kind: 'more-swaps', value: 4, message: '' })).toEqual([{ name: 'maxSwaps', value: '4' }]);
  });
});
