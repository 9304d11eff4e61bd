import js from '@eslint/js';
import tseslint from 'typescript-eslint';

// The folders are the dependency graph (docs/style.md §1):
//   renderer -> engine; electron -> engine; cli -> engine;
//   cli, electron -> hostio (Node-only file and terminal helpers) -> engine;
//   renderer -> electron only for the bridge's *types*; engine -> nothing of ours.
// Do not relax these rules; move the code instead.
const nodeBuiltins = ['node:*', 'fs', 'path', 'os', 'child_process', 'url', 'util', 'worker_threads'];

// Other layers use an engine folder through its hand-written index.ts only
// (docs/style.md §5): `../../engine/mission`, never
// `../../engine/mission/solveMission`. test/ and scripts/ may reach inside.
const deepEngineImport = {
  group: ['**/engine/*/*', '!**/engine/*/index'],
  message: 'Import from the engine folder (its index.ts), not its modules; export the name from that index.ts if it is missing.',
};
// No file is excepted (154 deep imports in 59 files were moved onto the
// indexes); do not add an exception list back, export the name instead.

export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', 'dist-web/', 'dist-electron/', 'dist-cli/', 'artifacts/', 'coverage/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['engine/**/*.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['**/renderer/**', '**/electron/**', '**/cli/**', '**/hostio/**', '**/test/**', '**/scripts/**'], message: 'engine/ depends on nothing of ours above it.' },
            { group: nodeBuiltins, message: 'engine/ is pure: file and process access belong to its callers.' },
            { group: ['react', 'react-dom', 'recharts', 'immer', 'electron'], message: 'engine/ uses zod at most.' },
          ],
        },
      ],
      'no-restricted-globals': ['error', 'Date', 'setTimeout', 'setInterval', 'performance', 'console'],
      'no-restricted-properties': ['error', { object: 'Math', property: 'random', message: 'The engine is deterministic: take a seed.' }],
    },
  },
  {
    files: ['renderer/**/*.ts', 'renderer/**/*.tsx'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['**/electron/**'], message: 'renderer/ may import electron/ only for the bridge types.', allowTypeImports: true },
            { group: ['**/cli/**'], message: 'renderer/ does not depend on the CLI.' },
            { group: ['**/hostio/**'], message: 'hostio/ is Node-only; the renderer runs in a sandboxed page.' },
            { group: nodeBuiltins, message: 'renderer/ runs in a sandboxed page.' },
            deepEngineImport,
          ],
        },
      ],
    },
  },
  {
    files: ['hostio/**/*.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        { patterns: [{ group: ['**/renderer/**', '**/electron/**', '**/cli/**'], message: 'hostio/ serves the CLI and the shell; it imports neither (engine/ at most).' }, deepEngineImport] },
      ],
    },
  },
  {
    files: ['electron/**/*.ts', 'cli/**/*.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        { patterns: [{ group: ['**/renderer/**'], message: 'The shell and CLI do not import the renderer.' }, deepEngineImport] },
      ],
    },
  },
);
