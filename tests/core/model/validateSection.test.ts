import { describe, expect, it } from 'vitest';
import { validateSection, validateSectionArrays } from '../../../src/core/model/validateSection';

const good = () => ({
  units: 'm',
  pins: [0, 100],
  horizons: [{ name: 'Top', line: [[0, 0], [50, 10], [100, 0]], regional: [[0, 0], [100, 0]], include: true, projected: [[0, 1]] }],
});

function problemsOf(input: unknown) {
  const v = validateSection(input);
  expect(v.ok).toBe(false);
  return v.ok ? [] : v.problems;
}

describe('validateSection(json)', () => {
  it('returns a Section for a well-formed file, surviving a JSON round trip', () => {
    const v = validateSection(JSON.parse(JSON.stringify(good())));
    expect(v.ok).toBe(true);
    if (v.ok) expect(v.section).toEqual(good());
  });

  it('accepts an empty horizon list (the analysis reports it) and feet', () => {
    expect(validateSection({ units: 'ft', pins: [1, 2], horizons: [] }).ok).toBe(true);
  });

  it('rejects a non-object with bad-shape', () => {
    expect(problemsOf([1, 2]).map((p) => p.code)).toEqual(['bad-shape']);
    expect(problemsOf(null).map((p) => p.code)).toEqual(['bad-shape']);
  });

  it('rejects units other than m and ft with bad-units', () => {
    const p = problemsOf({ ...good(), units: 'km' });
    expect(p[0].code).toBe('bad-units');
    expect(p[0].message).toContain('"km"');
  });

  it('rejects equal and reversed pins with pins-invalid', () => {
    expect(problemsOf({ ...good(), pins: [5, 5] })[0]).toMatchObject({ code: 'pins-invalid' });
    const p = problemsOf({ ...good(), pins: [100, 0] })[0];
    expect(p.code).toBe('pins-invalid');
    expect(p.message).toContain('reversed');
  });

  it('rejects NaN and Infinity with not-finite, naming the horizon', () => {
    const s = good();
    s.horizons[0].line[1] = [50, Number.NaN];
    const p = problemsOf(s)[0];
    expect(p).toMatchObject({ code: 'not-finite', horizon: 'Top' });
    expect(p.message).toContain('Horizon "Top"');
    const t = good();
    t.horizons[0].regional[0] = [Number.POSITIVE_INFINITY, 0];
    expect(problemsOf(t)[0].code).toBe('not-finite');
    expect(problemsOf({ ...good(), pins: [0, Infinity] })[0].code).toBe('not-finite');
  });

  it('rejects a line or regional with fewer than 2 points with too-few-points', () => {
    const s = good();
    s.horizons[0].regional = [[0, 0]];
    const p = problemsOf(s)[0];
    expect(p).toMatchObject({ code: 'too-few-points', horizon: 'Top' });
    expect(p.message).toContain('regional has 1 point');
  });

  it('rejects points that are not [x, z] pairs with bad-shape', () => {
    const s = { ...good(), horizons: [{ name: 'Top', line: [{ x: 0, z: 0 }, { x: 1, z: 1 }], regional: [[0, 0], [1, 0]] }] };
    expect(problemsOf(s)[0]).toMatchObject({ code: 'bad-shape', horizon: 'Top' });
  });

  it('rejects duplicate names with duplicate-name', () => {
    const s = good();
    s.horizons.push(structuredClone(s.horizons[0]));
    expect(problemsOf(s).map((p) => p.code)).toEqual(['duplicate-name']);
  });

  it('rejects a horizon without a name', () => {
    const s = { ...good(), horizons: [{ line: [[0, 0], [1, 0]], regional: [[0, 0], [1, 0]] }] };
    const p = problemsOf(s)[0];
    expect(p.code).toBe('bad-shape');
    expect(p.message).toContain('Horizon #1');
  });

  it('rejects projected runs that are reversed, out of range, not integers or overlapping', () => {
    for (const runs of [[[2, 1]], [[0, 3]], [[0.5, 1]], [[0, 2], [1, 2]], [[1, 1]], 'all']) {
      const s = { ...good(), horizons: [{ ...good().horizons[0], projected: runs }] };
      expect(problemsOf(s)[0]).toMatchObject({ code: 'bad-projected-run', horizon: 'Top' });
    }
  });

  it('rejects a non-number reference elevation and a non-boolean include', () => {
    expect(problemsOf({ ...good(), referenceElevation: 'high' })[0].code).toBe('bad-shape');
    const s = { ...good(), horizons: [{ ...good().horizons[0], include: 'yes' }] };
    expect(problemsOf(s)[0].code).toBe('bad-shape');
  });

  it('lists every problem, not just the first', () => {
    expect(problemsOf({ units: 'cm', pins: [3, 1], horizons: [] }).map((p) => p.code)).toEqual(['bad-units', 'pins-invalid']);
  });

  it('validateSectionArrays gives the same points as typed arrays, and the same problems', () => {
    const v = validateSectionArrays(good());
    expect(v.ok).toBe(true);
    if (v.ok) {
      const h = v.section.horizons[0];
      expect([Array.from(h.lineX), Array.from(h.lineZ)]).toEqual([[0, 50, 100], [0, 10, 0]]);
      expect([Array.from(h.regionalX), Array.from(h.regionalZ)]).toEqual([[0, 100], [0, 0]]);
      expect([h.name, h.include, h.projected]).toEqual(['Top', true, [[0, 1]]]);
    }
    const bad = good();
    bad.horizons[0].line[1] = [50, Number.NaN];
    const a = validateSectionArrays({ ...bad, units: 'km' });
    const b = validateSection({ ...bad, units: 'km' });
    expect(a.ok || b.ok).toBe(false);
    if (!a.ok && !b.ok) expect(a.problems).toEqual(b.problems);
  });

  it('validateSectionArrays writes the points into the arrays its allocator gives', () => {
    const given: Float64Array[] = [];
    const v = validateSectionArrays(good(), (n) => {
      const a = new Float64Array(n);
      given.push(a);
      return a;
    });
    expect(v.ok && v.section.horizons[0].lineX).toBe(given[0]);
    expect(given.map((a) => a.length)).toEqual([3, 3, 2, 2]);
  });

  it('reads a line given as coordinate arrays with the same checks and messages as [x, z] points', () => {
    // The same horizon line as the app hands it over (section.ts FlatLine).
    const flatOf = (pts: number[][]) => ({ xs: Float64Array.from(pts, (p) => p[0]), zs: Float64Array.from(pts, (p) => p[1]) });
    const asFlat = (line: number[][]) => ({ ...good(), horizons: [{ ...good().horizons[0], line: flatOf(line) }] });
    const v = validateSectionArrays(asFlat(good().horizons[0].line));
    const w = validateSectionArrays(good());
    expect(v.ok && w.ok).toBe(true);
    if (v.ok && w.ok) expect(v.section).toEqual(w.section);
    // Each bad point gives the problem the same point gives as a pair: NaN, Infinity, out of range, too few.
    for (const line of [[[0, 0], [50, Number.NaN], [100, 0]], [[0, 0], [Number.NEGATIVE_INFINITY, 1], [100, 0]], [[0, 0], [50, 2e9], [100, 0]], [[0, 0]]]) {
      const pairs = { ...good(), horizons: [{ ...good().horizons[0], line, projected: undefined }] };
      const flat = { ...asFlat(line), horizons: [{ ...asFlat(line).horizons[0], projected: undefined }] };
      expect(problemsOf(flat)).toEqual(problemsOf(pairs));
    }
    // Arrays of two lengths are refused.
    const uneven = { ...good(), horizons: [{ ...good().horizons[0], line: { xs: new Float64Array([0, 50, 100]), zs: new Float64Array([0, 10]) } }] };
    expect(problemsOf(uneven)[0]).toMatchObject({ code: 'bad-shape', horizon: 'Top' });
  });
});
