// The document the tool tests start from: calibrated 10 m per pixel (z = 1000 m at v = 0), one horizon.
import { emptyProjectDoc, type ProjectDoc } from '../../src/core/model/projectDoc';

export function toolDoc(): ProjectDoc {
  const doc = emptyProjectDoc();
  doc.calibration = { kind: 'affine', points: [{ u: 0, v: 0, x: 0, z: 1000 }, { u: 1000, v: 0, x: 10_000, z: 1000 }, { u: 0, v: 500, x: 0, z: -4000 }] };
  doc.horizons = [{ id: 'h1', name: 'Upper', colour: '#d1495b', visible: true, locked: false, pointsPx: [[0, 100], [200, 100], [500, 40], [800, 100], [1000, 100]], projected: [], joins: [] }];
  return doc;
}
