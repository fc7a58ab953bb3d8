// The document's calibration, fitted once per change, for components that map pixels to section units.
import { useMemo } from 'react';
import { fitCalibration, type FittedCalibration } from '../core/calibration/fitCalibration';
import { useDocStore } from './docStore';

/** Returns the fitted calibration of the open document, or null when it is missing or degenerate. */
export function useFittedCalibration(): FittedCalibration | null {
  const calibration = useDocStore((s) => s.doc.calibration);
  return useMemo(() => {
    if (!calibration) return null;
    const r = fitCalibration(calibration);
    return r.ok ? r.fit : null;
  }, [calibration]);
}
