// A small document for the command tests: calibrated 10 m per pixel, z = 1000 m at v = 0, two horizons.
import { emptyProjectDoc, type ProjectDoc } from '../../../../src/core/model/projectDoc';

/** Freezes a value and everything inside it, so a command that mutates its input throws. */
export function deepFreeze<T>(v: T): T {
  if (v && typeof v === 'object') {
    Object.freeze(v);
    for (const k of Object.keys(v)) deepFreeze((v as Record<string, unknown>)[k]);
  }
  return v;
}

/** Returns a frozen calibrated document with horizons h1 (an anticline at v = 100) and h2 (at v = 200). */
export function fixtureDoc(): ProjectDoc {
  const doc = emptyProjectDoc();
  doc.calibration = { kind: 'affine', points: [{ u: 0, v: 0, x: 0, z: 1000 }, { u: 1000, v: 0, x: 10_000, z: 1000 }, { u: 0, v: 500, x: 0, z: -4000 }] };
  doc.horizons = [
    { id: 'h1', name: 'Upper', colour: '#d1495b', visible: true, locked: false, pointsPx: [[0, 100], [200, 100], [500, 40], [800, 100], [1000, 100]], projected: [[1, 3]], joins: [] },
    { id: 'h2', name: 'Lower', colour: '#2e86ab', visible: true, locked: false, pointsPx: [[0, 210], [200, 200], [500, 160], [800, 200], [1000, 190]], projected: [], joins: [] },
  ];
  doc.scenarios[0].pinsPx = [[100, 300], [900, 300]];
  return deepFreeze(doc);
}
