// The project title and author, as shown in the figure's title block and the report.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { projectInfoProblem, setProjectInfo } from '../../../../src/core/model/commands/setProjectInfo';
import { LIMITS } from '../../../../src/core/model/limits';
import { emptyProjectDoc } from '../../../../src/core/model/projectDoc';
import { checkProjectDoc, PROJECT_LIMITS } from '../../../../src/core/model/projectSchema';
import { deepFreeze, fixtureDoc } from './docFixture';

describe('setProjectInfo', () => {
  it('setProjectInfo(doc, { title, author }) sets both, trimmed, without changing the input', () => {
    const doc = deepFreeze(fixtureDoc());
    const next = setProjectInfo(doc, { title: '  Ridge fold, line 4  ', author: '\tA. Mapper ' });
    expect(next.title).toBe('Ridge fold, line 4');
    expect(next.author).toBe('A. Mapper');
    expect(next.horizons).toBe(doc.horizons);
    expect(doc.title).toBe(emptyProjectDoc().title);
  });

  it('setProjectInfo keeps a field that is left out, and returns the same document when nothing changes', () => {
    const doc = setProjectInfo(fixtureDoc(), { title: 'T', author: 'A' });
    expect(setProjectInfo(doc, { author: 'B' })).toMatchObject({ title: 'T', author: 'B' });
    expect(setProjectInfo(doc, { title: 'U' })).toMatchObject({ title: 'U', author: 'A' });
    expect(setProjectInfo(doc, { title: ' T ', author: 'A' })).toBe(doc);
    expect(setProjectInfo(doc, {})).toBe(doc);
  });

  it('setProjectInfo gives an empty title the default title and allows an empty author', () => {
    const doc = setProjectInfo(fixtureDoc(), { title: 'T', author: 'A' });
    expect(setProjectInfo(doc, { title: '   ', author: '' })).toMatchObject({ title: emptyProjectDoc().title, author: '' });
  });

  it('setProjectInfo makes one line of text; a title or author over the name limit is refused whole, never cut', () => {
    const doc = setProjectInfo(fixtureDoc(), { title: 'Two\nlines\r\n  here', author: 'x'.repeat(LIMITS.nameLength) });
    expect(doc.title).toBe('Two lines here');
    // 201 characters (more than the old silent cut at 200) are kept whole: the limit is the schema's, in limits.ts.
    expect(setProjectInfo(doc, { title: 't'.repeat(201) }).title).toHaveLength(201);
    expect(doc.author).toHaveLength(LIMITS.nameLength);
    const over = { title: 'T', author: 'x'.repeat(LIMITS.nameLength + 1) };
    expect(projectInfoProblem(over)).toBe(`the author is too long (${LIMITS.nameLength + 1} characters; the limit is ${LIMITS.nameLength})`);
    expect(setProjectInfo(doc, over)).toBe(doc);
    expect(projectInfoProblem({ title: 'y'.repeat(LIMITS.nameLength + 1) })).toMatch(/^the title is too long/);
    expect(LIMITS.nameLength).toBe(PROJECT_LIMITS.nameLength);
  });

  it('setProjectInfo of any text gives a document that passes the file schema, and is idempotent (fast-check)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 2000 }), fc.string({ unit: 'binary', maxLength: 2000 }), (title, author) => {
        const once = setProjectInfo(fixtureDoc(), { title, author });
        expect(checkProjectDoc(once).ok).toBe(true);
        // Either both are taken (and fit the limit) or neither is, and the refusal says why.
        if (projectInfoProblem({ title, author })) expect(once).toEqual(fixtureDoc());
        expect(once.title.length).toBeLessThanOrEqual(LIMITS.nameLength);
        expect(once.title).toBe(once.title.trim());
        expect(once.title).not.toMatch(/[\r\n]/);
        expect(setProjectInfo(once, { title: once.title, author: once.author })).toBe(once);
      }),
      { seed: 20240502, numRuns: 300 },
    );
  });
});
