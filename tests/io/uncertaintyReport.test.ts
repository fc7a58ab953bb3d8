// The report's uncertainty part: the last Monte Carlo run (current, out of date or missing) and the
// sensitivity amplification; and the scenario comparison on one common reference.
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../src/core/analysis/analyseSection';
import type { Section } from '../../src/core/model/section';
import { amplificationOf, NO_MONTE_CARLO_TEXT, uncertaintyReport } from '../../src/io/uncertaintyReport';
import { resultsCsv } from '../../src/io/exportTables';
import { reportScenarioRows } from '../../src/panels/files/reportScenarioRows';
import { selectAnalysis } from '../../src/state/selectors';
import { sectionKey } from '../../src/core/model/sectionKey';
import type { MonteCarloRecord } from '../../src/core/analysis/monteCarloRecord';
import { SAMPLE_SECTION, sampleDoc } from './sampleDoc';

/** The sample with the lower crest raised 1 m: the points scatter a little about the line. */
function scattered(): Section {
  const s: Section = structuredClone(SAMPLE_SECTION);
  s.horizons[2].line![2] = [500, 301];
  return s;
}

function record(section: Section): MonteCarloRecord {
  return {
    sectionKey: sectionKey(section), units: 'm', seed: 7, runs: 2000, method: 'analytic',
    sigmas: { vertex: 2, offset: 5, perHorizonOffset: 1, tiltPerThousand: 0.5, scalePercent: 0.2 },
    referenceElevation: 500,
    depth: { p10: 1900, p50: 2000, p90: 2150 }, elevation: { p10: -1650, p50: -1500, p90: -1400 }, displacement: { p10: 90, p50: 100, p90: 110 },
    depthSd: 95.5, failedShare: 0.0125, finishedAt: 0, depths: new Float64Array(0), pointDepth: 2000,
  };
}

describe('uncertaintyReport', () => {
  const section = scattered();
  const out = analyseSection(section);
  const analysis = out.ok ? out.analysis : null;

  it('says there is no run yet, and where to make one', () => {
    const r = uncertaintyReport(null, section, analysis);
    expect(r.status).toBe('none');
    expect(r.lines).toEqual([NO_MONTE_CARLO_TEXT]);
  });

  it('gives P10/P50/P90 of depth, elevation and displacement, the σ values, seed, runs and failed share of a current run', () => {
    const r = uncertaintyReport(record(section), section, analysis);
    expect(r.status).toBe('current');
    const text = r.lines.join('\n');
    expect(text).toContain('Monte Carlo run of the state shown.');
    expect(text).toContain('below the reference at elevation 500 m: P10 1900 · P50 2000 · P90 2150 m (σ 95.5 m)');
    // Negative numbers in the report's text take the minus sign U+2212 (Unicode "MINUS SIGN").
    expect(text).toContain('Detachment elevation: P10 \u22121650 · P50 \u22121500 · P90 \u22121400 m');
    expect(text).not.toMatch(/(^|[^\w])-\d/);
    expect(text).toContain('Displacement: P10 90 · P50 100 · P90 110 m');
    expect(text).toContain('2000 runs, seed 7');
    expect(text).toContain('σ digitising 2 m, regional offset 5 m (all together) and 1 m (each horizon), tilt 0.5 m per 1000 m, calibration scale 0.2 %');
    expect(text).toContain('Runs without a valid detachment: 1.25 %.');
  });

  it('marks a run made for an earlier state of the section as out of date', () => {
    const moved: Section = structuredClone(section);
    moved.horizons[0].regional = [[-100, 510], [1100, 510]];
    const r = uncertaintyReport(record(section), moved, analysis);
    expect(r.status).toBe('stale');
    expect(r.lines[0]).toMatch(/^Out of date: .*earlier state of the section/);
    expect(r.rows[0]).toEqual(['monte_carlo_status', 'out of date (earlier state of the section)']);
  });

  it('amplification 1 + W0/D is what raising every flat regional does to the detachment elevation (closed form of docs/method.md §Sensitivity to the regional)', () => {
    const amp = amplificationOf(analysis);
    expect(amp).not.toBeNull();
    // Raise every regional by δ with the reference held (docs/method.md §Sensitivity to the regional: zd' = zd − δ(1 + W0/D)).
    const delta = 3;
    const raised: Section = structuredClone(section);
    for (const h of raised.horizons) h.regional = h.regional.map(([x, z]) => [x, z + delta]);
    const a = analyseSection(section, { referenceElevation: 500 }), b = analyseSection(raised, { referenceElevation: 500 });
    if (!a.ok || !b.ok) throw new Error('analysis failed');
    const rise = b.analysis.areaDepth!.detachmentElevation! - a.analysis.areaDepth!.detachmentElevation!;
    expect(rise).toBeCloseTo(delta * amp!, 6);
    expect(uncertaintyReport(null, section, analysis).amplificationText).toMatch(/^Sensitivity amplification 1 \+ W₀\/D = [\d.]+ .*moves the detachment about/);
  });

  it('goes into the results CSV: amplification row, Monte Carlo rows, or the no-run line', () => {
    const doc = sampleDoc();
    const da = selectAnalysis(doc);
    const none = resultsCsv(doc, da, uncertaintyReport(null, section, analysis))!;
    expect(none).toContain('sensitivity_amplification_1_plus_W0_over_D,');
    expect(none).toContain(`# monte carlo,${NO_MONTE_CARLO_TEXT}`);
    const withRun = resultsCsv(doc, da, uncertaintyReport(record(section), section, analysis))!;
    expect(withRun).toContain('monte_carlo_detachment_depth_p50_m,2000');
    expect(withRun).toContain('monte_carlo_failed_share,0.0125');
    // Data files stay machine-readable: the hyphen-minus of RFC 4180 CSV read by spreadsheets and Number().
    expect(withRun).toContain('monte_carlo_detachment_elevation_p50_m,-1500');
    expect(withRun).not.toContain('\u2212');
  });
});

describe('reportScenarioRows', () => {
  it('compares scenarios on elevation and on depths below one common reference (the shown scenario\'s)', () => {
    const doc = sampleDoc();
    const base = doc.scenarios[0];
    // A second scenario with every regional 20 image px higher (v down): its own reference is higher too.
    const raised = { ...base, id: 'scenario-raised', name: 'Raised', regionals: Object.fromEntries(Object.entries(base.regionals).map(([k, pts]) => [k, pts.map(([u, v]) => [u, v - 20] as [number, number])])) };
    doc.scenarios = [base, raised];
    const { common, rows } = reportScenarioRows(doc, {});
    const own = rows.map((r) => r.ownReference!);
    expect(own[1]).toBeGreaterThan(own[0]);
    expect(common).toBe(own[0]);
    // Like for like: the difference in depth below the common reference is the difference in elevation.
    expect(rows[1].depthBelowCommon! - rows[0].depthBelowCommon!).toBeCloseTo(-(rows[1].elevation! - rows[0].elevation!), 9);
    expect(rows[0].depthBelowCommon!).toBeCloseTo(own[0] - rows[0].elevation!, 9);
    expect(rows.map((r) => r.monteCarlo)).toEqual([null, null]);
  });
});
