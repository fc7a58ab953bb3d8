import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

// Imports point one way (DEVELOPERS.md, "Layout"): each folder of src may import itself and the folders
// listed for it, nothing else. Relative imports are matched on the folder names they pass through,
// which works because no folder inside src/ reuses the name of a top-level one.
const MAY_IMPORT = {
  core: [],
  format: ['core'],
  tools: ['core', 'format'],
  io: ['core', 'format'],
  state: ['core', 'format', 'tools', 'io'],
  canvas: ['core', 'format', 'tools', 'io', 'state'],
  panels: ['core', 'format', 'tools', 'io', 'state'],
  app: ['core', 'format', 'tools', 'io', 'state', 'canvas', 'panels'],
  cli: ['core', 'format'],
};
// Below the stores and the views: plain code with no React, Konva or store.
const NO_UI_PACKAGES = ['core', 'format', 'tools', 'io', 'cli'];
const UI_PACKAGES = ['react', 'react-dom', 'react-konva', 'konva', 'zustand'];

// No spread of a list into a call's arguments where the list can be data-sized: every element goes on
// the call stack, and past roughly 100,000 (V8) the call throws RangeError — one densely traced line
// blanked the page that way. Use minMax/minOf/maxOf (src/core/stats/minMax.ts) or a loop.
const NO_ARGUMENT_SPREAD = [
  { selector: "CallExpression[callee.object.name='Math'][callee.property.name=/^(min|max|hypot)$/] > SpreadElement", message: 'Math.min/max(...list) overflows the call stack on long lists: use minOf/maxOf (src/core/stats/minMax.ts) or a loop.' },
  { selector: "CallExpression[callee.property.name=/^(push|unshift)$/] > SpreadElement", message: 'push(...list) overflows the call stack on long lists: push in a loop.' },
  { selector: "CallExpression[callee.property.name='apply'][callee.object.property.name=/^(min|max|push|unshift)$/]", message: 'min/max/push.apply(null, list) overflows the call stack on long lists: use a loop.' },
];
// In src/ every spread into a call's arguments (any callee, `new` too) is banned, not only the known ones above:
// whether a list is small is not something the linter can prove. Where it is small by construction (a fixed tuple,
// a handful of values), the line says so in an eslint-disable-next-line comment naming the reason. An array
// literal's spread ([...xs]) is iterated, not put on the stack, and stays allowed.
const NO_CALL_SPREAD_IN_SRC = [
  { selector: "CallExpression:not([callee.object.name='Math'][callee.property.name=/^(min|max|hypot)$/]):not([callee.property.name=/^(push|unshift)$/]) > SpreadElement", message: 'A spread into a call puts every element on the call stack and throws past about 100,000: pass the list itself or loop; if the list is small by construction, say why in an eslint-disable-next-line comment.' },
  { selector: 'NewExpression > SpreadElement', message: 'A spread into a constructor puts every element on the call stack and throws past about 100,000: pass the list itself or loop; if the list is small by construction, say why in an eslint-disable-next-line comment.' },
];

function importDirection(folder) {
  const allowed = MAY_IMPORT[folder];
  const banned = Object.keys(MAY_IMPORT).filter((f) => f !== folder && !allowed.includes(f));
  const regex = `^\\.{1,2}/(.*/)?(${banned.join('|')})(/|$)`;
  const message = `src/${folder} may import only ${allowed.length ? allowed.map((f) => `src/${f}`).join(', ') : 'src/core'}: imports point one way (DEVELOPERS.md).`;
  const patterns = [{ regex, message }];
  if (NO_UI_PACKAGES.includes(folder)) {
    patterns.push({ group: UI_PACKAGES.flatMap((p) => [p, `${p}/*`]), message: `src/${folder} holds no React, Konva or stores (DEVELOPERS.md).` });
  }
  return {
    files: [`src/${folder}/**/*.{ts,tsx}`],
    rules: {
      'no-restricted-imports': ['error', { patterns }],
      // import('…') is not seen by no-restricted-imports.
      'no-restricted-syntax': ['error', { selector: `ImportExpression[source.value=/${regex.replaceAll('/', '\\/')}/]`, message }, ...NO_ARGUMENT_SPREAD, ...NO_CALL_SPREAD_IN_SRC],
    },
  };
}

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'reports/**', 'test-results/**', 'playwright-report/**', 'public/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx,js,mjs}'],
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'no-restricted-syntax': ['error', ...NO_ARGUMENT_SPREAD],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  ...Object.keys(MAY_IMPORT).map(importDirection),
);
