// A faulted section from the forward model (vertical simple shear over a ramp-flat fault; Gibbs 1983,
// J. Struct. Geol. 5, for the construction; exactness docs/method.md §Forward models) placed on a scan
// through an axes calibration of 10 m per pixel: every horizon's excess area is D·(z_r − zd).
import { fitCalibration, type FittedCalibration } from '../../src/core/calibration/fitCalibration';
import { sectionToImage } from '../../src/core/calibration/mapPoints';
import { faultedSection, type FaultedTruth } from '../../src/core/forward/faultedSection';
import type { ImagePx } from '../../src/core/model/projectDoc';
import type { XZ } from '../../src/core/model/section';

export const RAMP_FLAT: XZ[] = [[-8000, -3000], [6000, -3000], [8000, -1800], [9000, -600], [10500, 800], [30000, 800]];

export interface FaultedPx {
  frame: FittedCalibration;
  pins: [number, number];
  faultPx: ImagePx[];
  horizons: { pointsPx: ImagePx[]; joins: { at: number; faultId: string }[]; regionalPx: ImagePx[] }[];
  truth: FaultedTruth;
}

/** The forward model's section with displacement D, in image pixels (fault id "fault-1"). */
export function faultedPx(D: number, rightToLeft = false): FaultedPx {
  const cal = fitCalibration({ kind: 'axes', xPoints: [{ u: 0, v: 0, value: -10000 }, { u: 5000, v: 0, value: 40000 }], zPoints: [{ u: 0, v: 0, value: 2000 }, { u: 0, v: 600, value: -4000 }] });
  if (!cal.ok) throw new Error(cal.message);
  const frame = cal.fit;
  const px = (q: XZ) => sectionToImage(frame, q);
  const levels = [500, -500, -1500, -2500].map((r, i) => ({ name: `L${i}`, regionalElevation: r }));
  const { section, truth } = faultedSection({ units: 'm', pins: [0, 20000], displacement: D, fault: RAMP_FLAT, horizons: levels, rightToLeft });
  const horizons = section.horizons.map((h) => {
    const [a, b] = h.pieces!;
    return { pointsPx: [...a, ...b].map(px), joins: [{ at: a.length, faultId: 'fault-1' }], regionalPx: h.regional.map(px) };
  });
  return { frame, pins: section.pins, faultPx: section.faults![0].line.map(px), horizons, truth };
}
