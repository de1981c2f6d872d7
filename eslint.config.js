// Lint rules, including the one-way dependency rules of the architecture:
//   model     -> nothing outside model
//   schedules -> model
//   cli       -> schedules, model (+ node)
//   renderer  -> schedules, model (+ react), never electron or node
//   main      -> schedules, model (+ electron, node)
import js from '@eslint/js';
import tseslint from 'typescript-eslint';

const platformModules = [
  { group: ['electron', 'electron/*'], message: 'Pure code must not import Electron.' },
  { group: ['react', 'react-dom', 'react/*', 'react-dom/*', 'recharts'], message: 'Pure code must not import UI libraries.' },
  { group: ['node:*', 'fs', 'path', 'os', 'child_process', 'worker_threads', 'url', 'crypto'], message: 'Pure code must not import Node built-ins.' },
];
const layer = (names) => ({ group: names.flatMap((n) => [`**/${n}/*`, `**/${n}`]), message: 'This import crosses a one-way layer boundary.' });

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'renderer/dist/**', 'release/**', 'tests/artifacts/**', 'model/data/embedded.generated.ts'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { console: 'readonly', process: 'readonly' } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['model/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [...platformModules, layer(['schedules', 'cli', 'main', 'renderer'])] }],
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/ban-ts-comment': ['error', { 'ts-expect-error': true, 'ts-ignore': true, 'ts-nocheck': true }],
      'no-restricted-globals': ['error', 'window', 'document', 'fetch', 'localStorage'],
    },
  },
  {
    files: ['schedules/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [...platformModules, layer(['cli', 'main', 'renderer'])] }],
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/ban-ts-comment': ['error', { 'ts-expect-error': true, 'ts-ignore': true, 'ts-nocheck': true }],
      'no-restricted-globals': ['error', 'window', 'document', 'fetch', 'localStorage'],
    },
  },
  {
    files: ['cli/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [platformModules[0], platformModules[1], layer(['main', 'renderer'])] }],
    },
  },
  {
    files: ['renderer/**/*.ts', 'renderer/**/*.tsx'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [platformModules[0], platformModules[2], layer(['main', 'cli'])] }],
    },
  },
  {
    files: ['main/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [platformModules[1], layer(['cli', 'renderer'])] }],
    },
  },
);
