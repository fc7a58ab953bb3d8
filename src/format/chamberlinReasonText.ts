// Why a horizon has no Chamberlin depth, in words, its numbers written by the one number rule
// (formatQuantity.ts); the engine gives the reason as data (core/analysis/chamberlinDepth.ts).
import type { ChamberlinReason } from '../core/analysis/chamberlinDepth';
import { formatSmallLength } from './formatQuantity';

/** Returns the reason in words (no full stop), lengths in `units` with two significant figures, a tiny one in exponent form. */
export function chamberlinReasonText(reason: ChamberlinReason, units: string): string {
  switch (reason.kind) {
    case 'not-finite': return 'its lengths or area are not finite numbers';
    case 'equal-lengths': return 'bed length equals regional length';
    case 'longer-but-lost': return 'the bed is longer than its regional but the area is lost below it';
    case 'shorter-but-lifted': return 'the bed is shorter than its regional but the area is lifted above it';
    case 'not-meaningful': {
      const s = reason.shortening;
      return `not meaningful: the bed is only ${formatSmallLength(Math.abs(s), units)} ${s > 0 ? 'longer' : 'shorter'} than its regional, less than the ${formatSmallLength(reason.resolution, units)} the digitising resolves`;
    }
  }
}
