// When a calibration point's misfit deserves a warning. A click on a scan at working zoom lands within
// about 1–2 px of the mark aimed at (common practice for manual digitising), and a value read from a
// labelled tick is good to a fraction of a percent of the axis; beyond 3 px or 0.5% of the calibrated
// extent, the point is more likely mistyped or misplaced than imprecise.
import type { CalibrationPointResidual } from '../../core/calibration/fitCalibration';

export const RESIDUAL_WARN_PX = 3;
export const RESIDUAL_WARN_SHARE = 0.005;

/** Returns true when the residual is above either tolerance (extent in section units). */
export function residualTooLarge(r: CalibrationPointResidual, extent: number): boolean {
  return Math.abs(r.residualPx) > RESIDUAL_WARN_PX || (extent > 0 && Math.abs(r.residual) / extent > RESIDUAL_WARN_SHARE);
}
