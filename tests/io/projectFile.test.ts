import { describe, expect, it } from 'vitest';
import { parseProjectText, serializeProject } from '../../src/io/projectFile';
import { emptyProjectDoc, SCHEMA_VERSION } from '../../src/core/model/projectDoc';
import { SECTION_CAUTION } from '../../src/core/analysis/caution';
import { SAMPLE_SECTION, sampleDoc } from './sampleDoc';

describe('serializeProject / parseProjectText', () => {
  it('round-trips the document and the scan bytes exactly', () => {
    const doc = { ...sampleDoc(), scan: { id: 'scan-1', name: 'scan.png', widthPx: 4, heightPx: 3, type: 'image/png' } };
    const bytes = Uint8Array.from({ length: 70_001 }, (_, i) => (i * 7919) % 256);
    const text = serializeProject(doc, { type: 'image/png', name: 'scan.png', bytes }, '2024-01-01T00:00:00.000Z');
    const back = parseProjectText(text, 'p.json');
    expect(back.ok).toBe(true);
    if (!back.ok) return;
    expect(back.doc).toEqual(doc);
    expect(back.scan?.bytes).toEqual(bytes);
    expect(back.kind).toBe('project');
    // And again: the second save is byte-identical (the format is stable).
    expect(serializeProject(back.doc, back.scan, '2024-01-01T00:00:00.000Z')).toBe(text);
  });

  it('opens the plain section file as a document with horizons, regionals and pins', () => {
    const r = parseProjectText(JSON.stringify(SAMPLE_SECTION), 'fold.json');
    expect(r.ok && r.kind).toBe('section');
    if (!r.ok) return;
    expect(r.doc.title).toBe('fold');
    expect(r.doc.horizons).toHaveLength(3);
    expect(Object.keys(r.doc.scenarios[0].regionals)).toHaveLength(3);
    expect(r.doc.scenarios[0].pinsPx).not.toBeNull();
  });

  it('keeps hostile names as plain data', () => {
    const doc = sampleDoc();
    doc.title = '<img src=x onerror=alert(1)>';
    doc.horizons[0].name = '"><script>alert(1)</script>';
    const r = parseProjectText(serializeProject(doc, null), 'p.json');
    expect(r.ok && r.doc.horizons[0].name).toBe('"><script>alert(1)</script>');
    expect(r.ok && r.doc.title).toBe('<img src=x onerror=alert(1)>');
  });

  it('says why a truncated, empty, foreign or newer file cannot be opened', () => {
    const text = serializeProject(sampleDoc(), null);
    const truncated = parseProjectText(text.slice(0, text.length / 2), 'half.json');
    expect(!truncated.ok && truncated.message).toMatch(/half\.json is not valid JSON.*truncated/);
    expect(!parseProjectText('', 'e.json').ok).toBe(true);
    const foreign = parseProjectText('{"hello": 1}', 'f.json');
    expect(!foreign.ok && foreign.message).toMatch(/not a Foldroot project/);
    const newer = parseProjectText(JSON.stringify({ format: 'foldroot-project', version: SCHEMA_VERSION + 1, doc: emptyProjectDoc(), scan: null }), 'n.json');
    expect(!newer.ok && newer.message).toMatch(/newer Foldroot/);
  });

  it('refuses a section file with problems, quoting the engine validator', () => {
    const bad = { ...SAMPLE_SECTION, pins: [1000, 0] };
    const r = parseProjectText(JSON.stringify(bad), 's.json');
    expect(!r.ok && r.message).toMatch(/section file.*reversed/);
  });

  it('notes a document whose scan is not stored in the file', () => {
    const doc = { ...sampleDoc(), scan: { id: 's', name: 'away.png', widthPx: 10, heightPx: 10, type: 'image/png' } };
    const r = parseProjectText(serializeProject(doc, null));
    expect(r.ok && r.notes.join(' ')).toMatch(/away\.png.*not stored/);
  });

  it('refuses a file changed after saving (a digit altered) and opens it once the check line is removed', () => {
    const text = serializeProject(sampleDoc(), null);
    const altered = text.replace('"u":1900', '"u":1901');
    expect(altered).not.toBe(text);
    const r = parseProjectText(altered, 'a.json');
    expect(!r.ok && r.message).toMatch(/damaged.*check value/);
    const unchecked = JSON.parse(altered);
    delete unchecked.check;
    expect(parseProjectText(JSON.stringify(unchecked)).ok).toBe(true);
  });

  it('writes the caution in a "caution" field, outside the document and the check', () => {
    const text = serializeProject(sampleDoc(), null, '2024-01-01T00:00:00.000Z');
    const file = JSON.parse(text);
    expect(file.caution).toBe(SECTION_CAUTION);
    expect(file.doc.caution).toBeUndefined();
    const back = parseProjectText(text, 'p.json');
    expect(back.ok && back.doc).toEqual(sampleDoc());
    // A file saved before the caution was written (no "caution", same check) still opens.
    delete file.caution;
    const old = parseProjectText(JSON.stringify(file), 'old.json');
    expect(old.ok && old.doc).toEqual(sampleDoc());
    expect(old.ok && old.migratedFrom).toBe(null);
  });
});
