// The uncertainty part of the report and the results table: the last Monte Carlo run of the scenario
// (marked when it was computed for another state of the section, or said to be missing) and the
// sensitivity amplification 1 + W0/D (docs/method.md §Sensitivity to the regional). Pure.
import type { SectionAnalysis } from '../core/analysis/analyseSection';
import type { AnySection } from '../core/model/section';
import { isStale } from '../core/model/sectionKey';
import type { MonteCarloRecord, Percentiles } from '../core/analysis/monteCarloRecord';
import { formatNumber } from '../format/formatQuantity';

/** The report's sentence when the scenario has no Monte Carlo run in this session. */
export const NO_MONTE_CARLO_TEXT = 'No Monte Carlo run yet — run one in the Uncertainty panel.';

export interface UncertaintyReport {
  /** 'none': no run; 'stale': the run was for an earlier state of the section; 'current'. */
  status: 'none' | 'stale' | 'current';
  /** Sentences for the report, in order (status line, spreads, settings). */
  lines: string[];
  /** Name / value rows for a results table (empty without a run). */
  rows: [string, string | number | null][];
  /** 1 + W0/D, or null without a detachment. */
  amplification: number | null;
  /** One sentence on the amplification (empty without a detachment). */
  amplificationText: string;
}

const spread = (p: Percentiles | null, u: string) => (p ? `P10 ${formatNumber(p.p10)} · P50 ${formatNumber(p.p50)} · P90 ${formatNumber(p.p90)} ${u}` : 'no run gave a detachment');

/** Returns 1 + W0/D for the analysis, for either sign of D (null when there is no detachment). */
export function amplificationOf(analysis: SectionAnalysis | null): number | null {
  const ad = analysis?.areaDepth;
  if (!analysis || !ad || ad.noDetachment || ad.displacement === 0) return null;
  return 1 + analysis.pinWidth / ad.displacement;
}

/** Returns the uncertainty text and rows for a scenario's last Monte Carlo record (null: none) against the current section (null: no section). */
export function uncertaintyReport(record: MonteCarloRecord | null, section: AnySection | null, analysis: SectionAnalysis | null): UncertaintyReport {
  const amplification = amplificationOf(analysis);
  const u = analysis?.units ?? section?.units ?? record?.units ?? 'm';
  const amplificationText = amplification === null ? '' : `Sensitivity amplification 1 + W₀/D = ${formatNumber(amplification, 3)} (W₀ = ${formatNumber(analysis!.pinWidth)} ${u}, D = ${formatNumber(analysis!.areaDepth!.displacement)} ${u}): raising every regional by 10 ${u} moves the detachment about ${formatNumber(10 * Math.abs(amplification), 3)} ${u} ${amplification > 0 ? 'up' : 'down'}, so an error in the regionals reaches the depth ${formatNumber(Math.abs(amplification), 3)} times larger.`;
  if (!record) return { status: 'none', lines: [NO_MONTE_CARLO_TEXT], rows: [], amplification, amplificationText };
  const stale = !section || isStale(record, section);
  const ru = record.units;
  const s = record.sigmas;
  const lines = [
    stale
      ? `Out of date: this Monte Carlo run was made for an earlier state of the section (the pins, regionals or horizons have changed since); run it again for the state shown.`
      : 'Monte Carlo run of the state shown.',
    `Detachment depth below the reference at elevation ${formatNumber(record.referenceElevation)} ${ru}: ${spread(record.depth, ru)}${record.depthSd !== null ? ` (σ ${formatNumber(record.depthSd, 3)} ${ru})` : ''}.`,
    `Detachment elevation: ${spread(record.elevation, ru)}.`,
    `Displacement: ${spread(record.displacement, ru)}.`,
    `Settings: ${record.runs} runs, seed ${record.seed}, ${record.method === 'vertices' ? 'every vertex perturbed' : 'per-horizon area noise (analytic)'}; σ digitising ${formatNumber(s.vertex)} ${ru}, regional offset ${formatNumber(s.offset)} ${ru} (all together) and ${formatNumber(s.perHorizonOffset)} ${ru} (each horizon), tilt ${formatNumber(s.tiltPerThousand)} ${ru} per 1000 ${ru}, calibration scale ${formatNumber(s.scalePercent)} %.`,
    `Runs without a valid detachment: ${formatNumber(100 * record.failedShare, 3)} %.`,
  ];
  const rows: [string, string | number | null][] = [
    ['monte_carlo_status', stale ? 'out of date (earlier state of the section)' : 'current'],
    ['monte_carlo_runs', record.runs], ['monte_carlo_seed', record.seed], ['monte_carlo_method', record.method],
    [`monte_carlo_reference_elevation_${ru}`, record.referenceElevation],
  ];
  for (const [name, p] of [['detachment_depth', record.depth], ['detachment_elevation', record.elevation], ['displacement', record.displacement]] as const) {
    rows.push([`monte_carlo_${name}_p10_${ru}`, p?.p10 ?? null], [`monte_carlo_${name}_p50_${ru}`, p?.p50 ?? null], [`monte_carlo_${name}_p90_${ru}`, p?.p90 ?? null]);
  }
  rows.push([`monte_carlo_depth_sd_${ru}`, record.depthSd], ['monte_carlo_failed_share', record.failedShare],
    [`sigma_digitising_${ru}`, s.vertex], [`sigma_regional_offset_${ru}`, s.offset], [`sigma_regional_offset_each_horizon_${ru}`, s.perHorizonOffset],
    [`sigma_tilt_${ru}_per_1000_${ru}`, s.tiltPerThousand], ['sigma_scale_percent', s.scalePercent]);
  return { status: stale ? 'stale' : 'current', lines, rows, amplification, amplificationText };
}
