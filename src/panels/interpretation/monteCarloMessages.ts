// Messages between the Monte Carlo panel and its worker (plain, structured-cloneable data).
import type { MonteCarloOptions, SpreadSummary } from '../../core/analysis/monteCarlo';
import type { Section } from '../../core/model/section';

export interface MonteCarloRequest { section: Section; options: MonteCarloOptions }

export interface MonteCarloDone {
  type: 'done';
  runs: number;
  valid: number;
  failedShare: number;
  depths: Float64Array;
  depth: SpreadSummary | null;
  elevation: SpreadSummary | null;
  displacement: SpreadSummary | null;
  pointDepth: number | null;
}

export type MonteCarloReply =
  | { type: 'progress'; done: number; total: number }
  | MonteCarloDone
  | { type: 'failed'; message: string };
