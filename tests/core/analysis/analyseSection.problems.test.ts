import { describe, expect, it } from 'vitest';
import { analyseSection, type SectionProblemCode } from '../../../src/core/analysis/analyseSection';
import type { Section } from '../../../src/core/model/section';
import { methodExample, pts } from './sections';

function codes(s: unknown): SectionProblemCode[] {
  const out = analyseSection(s as Section);
  expect(out.ok).toBe(false);
  return out.ok ? [] : out.problems.map((p) => p.code);
}

function firstProblem(s: Section) {
  const out = analyseSection(s);
  if (out.ok) throw new Error('expected problems');
  return out.problems[0];
}

describe('analyseSection(section) input problems, as typed results', () => {
  it('reports an empty section', () => {
    expect(codes({ units: 'm', pins: [0, 1], horizons: [] })).toEqual(['empty-section']);
  });

  it('reports a horizon with fewer than 2 points', () => {
    const s = methodExample();
    s.horizons[1].line = [[0, 0]];
    expect(codes(s)).toEqual(['too-few-points']);
  });

  it('reports a line that does not reach a pin, naming the horizon and the pin', () => {
    const s = methodExample();
    s.horizons[2].line = pts(100, -1500, 5000, -1000, 10_000, -1500);
    const p = firstProblem(s);
    expect(p).toMatchObject({ code: 'misses-pin', horizon: 'H3' });
    expect(p.message).toContain('left pin');
  });

  it('reports a regional that does not reach a pin', () => {
    const s = methodExample();
    s.horizons[0].regional = pts(0, -500, 9000, -500);
    expect(firstProblem(s)).toMatchObject({ code: 'misses-pin', horizon: 'H1' });
    expect(firstProblem(s).message).toContain('regional does not reach the right pin');
  });

  it('reports a line that crosses a pin twice', () => {
    const s = methodExample();
    s.horizons[0].line = pts(-10, -500, 100, -400, -20, -300, 5000, 0, 10_000, -500);
    expect(firstProblem(s)).toMatchObject({ code: 'crosses-pin-twice', horizon: 'H1' });
  });

  it('reports a self-intersecting horizon', () => {
    const s = methodExample();
    s.horizons[0].line = pts(0, -500, 6000, -500, 6000, 0, 4000, -600, 10_000, -500);
    const p = firstProblem(s);
    expect(p).toMatchObject({ code: 'self-intersecting', horizon: 'H1' });
    expect(p.message).toContain('crosses itself');
    // Analytic: segment 0–1 is z = −500; segment 2–3 runs (6000, 0) → (4000, −600) and reaches
    // z = −500 at 5/6 of its length, x = 6000 − 2000·5/6 = 4333.33.
    expect(p.message).toContain('segments 0–1 and 2–3 cross at x ≈ 4333.33');
  });

  it('names the input segments and the crossing point whichever way the line runs and wherever the pin cuts it', () => {
    const line = pts(-100, -500, 6000, -500, 6000, 0, 4000, -600, 10_000, -500);
    const s = methodExample();
    s.horizons[0].line = line;
    // The left pin cuts input segment 0–1; the crossing is the same as above (analytic).
    expect(firstProblem(s).message).toContain('segments 0–1 and 2–3 cross at x ≈ 4333.33');
    s.horizons[0].line = [...line].reverse();
    // Reversed, the same segments are input vertices 2–3 and 0–1 counted from the other end.
    expect(firstProblem(s).message).toContain('segments 1–2 and 3–4 cross at x ≈ 4333.33');
  });

  it('reports NaN and Infinity', () => {
    const s = methodExample();
    s.horizons[0].line[1] = [5000, Number.NaN];
    expect(codes(s)).toEqual(['not-finite']);
    expect(codes({ ...methodExample(), referenceElevation: Infinity })).toEqual(['not-finite']);
  });

  it('reports a non-finite reference elevation option', () => {
    const out = analyseSection(methodExample(), { referenceElevation: Number.NaN });
    expect(out.ok ? [] : out.problems.map((p) => p.code)).toEqual(['not-finite']);
  });

  it('reports pins equal or reversed', () => {
    expect(codes({ ...methodExample(), pins: [10, 10] })).toEqual(['pins-invalid']);
    expect(codes({ ...methodExample(), pins: [10_000, 0] })).toEqual(['pins-invalid']);
  });

  it('reports duplicate names', () => {
    const s = methodExample();
    s.horizons[1].name = 'H1';
    expect(codes(s)).toEqual(['duplicate-name']);
  });

  it('reports bad projected runs and bad units', () => {
    const s = methodExample();
    s.horizons[0].projected = [[1, 7]];
    expect(codes(s)).toEqual(['bad-projected-run']);
    expect(codes({ ...methodExample(), units: 'yd' })).toEqual(['bad-units']);
  });

  it('reports every problem of every horizon, not only the first', () => {
    const s = methodExample();
    s.horizons[0].line = pts(100, -500, 10_000, -500);
    s.horizons[3].regional = pts(-5, -2000, 50, -2000);
    expect(codes(s)).toEqual(['misses-pin', 'misses-pin']);
  });
});
