// ESLint flat config: TypeScript, React hooks, and the import boundaries of DEVELOPERS.md.
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import { importX } from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import globals from 'globals';

const features = readdirSync(new URL('./src/features/', import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

/** DEVELOPERS.md "Map": who may import whom. Paths are resolved, so `../..` and aliases count alike. */
const boundaries = [
  ...features.map((feature) => ({
    target: `./src/features/${feature}`,
    from: './src/features',
    except: [`./${feature}`],
    message: 'Client features never import each other: move what both need to src/components, src/lib or shared/.',
  })),
  {
    target: './shared',
    from: ['./src', './server', './scripts', './tests'],
    message: 'shared/ is pure and isomorphic: it imports nothing from src/, server/, scripts/ or tests/.',
  },
  { target: './src', from: ['./server', './scripts', './tests'], message: 'The client reaches the server over HTTP only; shared types live in shared/.' },
  { target: './server', from: ['./src', './tests', './scripts'], message: 'Server code never imports the client, tests or scripts.' },
  { target: './server/routes', from: './server/models', message: 'Routes call services; only services reach models.' },
];

export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', '.data/', 'test-results/', 'coverage/', 'tests/reference/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: './tsconfig.json' })],
    },
    rules: {
      'import-x/no-restricted-paths': ['error', { zones: boundaries }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    ...reactHooks.configs.flat.recommended,
  },
  {
    // One client API layer: every server call has its one fetcher (and its query options) in src/lib/api/.
    files: ['src/features/**/*.{ts,tsx}', 'src/app/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['**/lib/api-client'], importNames: ['api'], message: 'Call the server through the fetchers and query options of src/lib/api/.' },
            { group: ['**/lib/upload-file'], message: 'Uploads go through the fetchers of src/lib/api/.' },
          ],
        },
      ],
    },
  },
  {
    files: ['*.js'],
    languageOptions: { globals: globals.node },
  },
);
