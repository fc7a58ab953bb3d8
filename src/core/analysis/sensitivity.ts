import { createEvaluationScratch, evaluateShifted, type QuickDetachment } from './evaluateShifted';
import type { PreparedSection } from './prepareSection';
import type { SectionAdjustment } from './shiftRegionals';

// Sensitivity of the detachment to the regional (docs/method.md §Sensitivity to the regional, our
// derivation): raising every regional by δ drops each excess area by W0·δ and each depth by δ,
// so zd' = zd − δ(1 + W0/D); a regional error is amplified by 1 + W0/D. The sweeps below use the
// exact fast path (shiftRegionals), so they hold for inclined and curved regionals too.

/** One sweep position: the swept value and the point estimates there (null when no detachment). */
export interface SensitivityPoint {
  value: number;
  depth: number | null;
  elevation: number | null;
  displacement: number | null;
}

export interface SensitivitySweep {
  /** Without any sweep adjustment (but with `base`). */
  base: QuickDetachment | null;
  /** Common regional offset δ (units) against detachment depth. */
  offsets: SensitivityPoint[];
  /** Common regional tilt t (dz/dx) about the chosen pin against detachment depth. */
  tilts: SensitivityPoint[];
  /** 1 + W0/D at the base estimate (dimensionless); null when there is no detachment. */
  amplification: number | null;
  /** x of the pin the tilt turns about (units). */
  tiltPivotX: number;
}

export interface SensitivityOptions {
  /** Offsets δ to sweep (units). */
  offsets: ArrayLike<number>;
  /** Tilts t to sweep (dz/dx, dimensionless). */
  tilts: ArrayLike<number>;
  /** Pin the regionals turn about when tilted (default the left pin). */
  tiltPivot?: 'left' | 'right';
  /** Adjustment applied under every sweep point, e.g. per-horizon regional offsets. */
  base?: SectionAdjustment;
}

/** Detachment depth and elevation (units) over sweeps of a common regional offset and tilt; null entries where no detachment. */
export function regionalSensitivity(prepared: PreparedSection, options: SensitivityOptions): SensitivitySweep {
  const scratch = createEvaluationScratch(prepared);
  const base = options.base ?? {};
  const tiltPivotX = options.tiltPivot === 'right' ? prepared.pins[1] : prepared.pins[0];
  const point = (value: number, adj: SectionAdjustment): SensitivityPoint => {
    const q = evaluateShifted(prepared, { ...base, ...adj }, scratch);
    const ok = q !== null && !q.noDetachment;
    return { value, depth: ok ? q.detachmentDepth : null, elevation: ok ? q.detachmentElevation : null, displacement: ok ? q.displacement : null };
  };
  const baseQuick = evaluateShifted(prepared, base, scratch);
  const offsets = Array.from(options.offsets, (d) => point(d, { regionalOffset: (base.regionalOffset ?? 0) + d }));
  const tilts = Array.from(options.tilts, (t) => point(t, { regionalTilt: (base.regionalTilt ?? 0) + t, tiltPivotX }));
  return {
    base: baseQuick,
    offsets,
    tilts,
    amplification: regionalAmplification(prepared.pinWidth, baseQuick),
    tiltPivotX,
  };
}

/** The amplification 1 + W0/D of a regional error (dimensionless, either sign of D); null when there is no detachment. */
export function regionalAmplification(pinWidth: number, quick: QuickDetachment | null): number | null {
  if (!quick || quick.noDetachment || quick.displacement === 0) return null;
  return 1 + pinWidth / quick.displacement;
}
