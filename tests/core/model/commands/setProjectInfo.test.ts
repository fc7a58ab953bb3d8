// The project title and author, as shown in the figure's title block and the report.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PROJECT_INFO_MAX_LENGTH, setProjectInfo } from '../../../../src/core/model/commands/setProjectInfo';
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

  it('setProjectInfo makes one line of text and caps its length', () => {
    const doc = setProjectInfo(fixtureDoc(), { title: 'Two\nlines\r\n  here', author: 'x'.repeat(10_000) });
    expect(doc.title).toBe('Two lines here');
    expect(doc.author).toHaveLength(PROJECT_INFO_MAX_LENGTH);
    // The cap keeps a saved file within the schema's string limit.
    expect(PROJECT_INFO_MAX_LENGTH).toBeLessThanOrEqual(PROJECT_LIMITS.nameLength);
  });

  it('setProjectInfo of any text gives a document that passes the file schema, and is idempotent (fast-check)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 2000 }), fc.string({ unit: 'binary', maxLength: 2000 }), (title, author) => {
        const once = setProjectInfo(fixtureDoc(), { title, author });
        expect(checkProjectDoc(once).ok).toBe(true);
        expect(Array.from(once.title).length).toBeLessThanOrEqual(PROJECT_INFO_MAX_LENGTH);
        expect(once.title).toBe(once.title.trim());
        expect(once.title).not.toMatch(/[\r\n]/);
        expect(setProjectInfo(once, { title: once.title, author: once.author })).toBe(once);
      }),
      { seed: 20240502, numRuns: 300 },
    );
  });
});
