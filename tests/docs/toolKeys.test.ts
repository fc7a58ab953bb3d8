import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { TOOLS } from '../../src/tools/toolRegistry';

// README's usage names every tool with its shortcut ("*Fault*, `k`"), so the two cannot drift apart.
describe('README and the tool registry', () => {
  const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
  for (const t of TOOLS) {
    if (t.tool.id === 'select') continue;
    it(`README gives the ${t.label} tool's key \`${t.key}\``, () => {
      expect(readme).toContain(`\`${t.key}\``);
      expect(new Set(TOOLS.map((k) => k.key)).size).toBe(TOOLS.length);
    });
  }
});
