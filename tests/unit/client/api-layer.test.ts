import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { queryKeys } from '../../../src/lib/query-keys';
import { recipeQuery, versionQuery } from '../../../src/lib/api/recipes';

const apiDir = join(import.meta.dirname, '../../../src/lib/api');

/** Every server call written in src/lib/api as "METHOD /path", with `${…}` parts as ":x". */
function serverCalls(): string[] {
  const calls: string[] = [];
  for (const file of readdirSync(apiDir)) {
    const text = readFileSync(join(apiDir, file), 'utf8');
    for (const m of text.matchAll(/api\.(get|post|put|patch|delete)(?:<[^(]*>)?\(\s*(?:'([^']+)'|`([^`]+)`|(\w+)\()/g)) {
      calls.push(`${m[1].toUpperCase()} ${(m[2] ?? m[3] ?? `${m[4]}()`).replace(/\$\{[^}]+\}/g, ':x')}`);
    }
    for (const m of text.matchAll(/uploadFile<[^>]*>\(\s*(?:'([^']+)'|`([^`]+)`)/g)) calls.push(`UPLOAD ${(m[1] ?? m[2]).replace(/\$\{[^}]+\}/g, ':x')}`);
  }
  return calls;
}

describe('the client API layer', () => {
  it('has one fetcher per server call', () => {
    const calls = serverCalls();
    expect(calls.length).toBeGreaterThan(40);
    const repeated = calls.filter((c, i) => calls.indexOf(c) !== i);
    expect(repeated).toEqual([]);
  });

  it('reads a recipe and its versions under the recipe keys whoever asks (owner, coach, prep, shopping)', () => {
    expect(recipeQuery(7).queryKey).toEqual(queryKeys.recipes.detail(7));
    expect(versionQuery(7, 2).queryKey).toEqual([...queryKeys.recipes.versions(7), 2]);
    expect(recipeQuery(null).enabled).toBe(false);
  });
});
