import { describe, expect, it } from 'vitest';
import { fitCalibration } from '../../../../src/core/calibration/fitCalibration';
import { imageToSection } from '../../../../src/core/calibration/mapPoints';
import { sectionToProjectDoc } from '../../../../src/core/model/migrations/sectionToProjectDoc';
import type { Section, XZ } from '../../../../src/core/model/section';

describe('sectionToProjectDoc', () => {
  it('opens a section whose horizons are far longer than a call can take as arguments, every vertex in place', () => {
    // 12 horizons of 100,000 vertices: a spread of 1.2 million numbers into Math.min overflows V8's call stack
    // (the engine's limit on arguments, common practice to avoid for data-sized arrays).
    const n = 100_000;
    const line = (k: number): XZ[] => Array.from({ length: n }, (_, i): XZ => [(20000 * i) / (n - 1), -300 * k + 100 * Math.sin(i / 500)]);
    const section: Section = {
      units: 'm', pins: [1000, 19000],
      horizons: Array.from({ length: 12 }, (_, k) => ({ name: `H${k}`, line: line(k), regional: [[0, -300 * k], [20000, -300 * k]] as XZ[] })),
    };
    const doc = sectionToProjectDoc(section, 'Long');
    expect(doc.horizons).toHaveLength(12);
    expect(doc.horizons[11].pointsPx).toHaveLength(n);
    // Mapping the pixels back through the calibration gives the section's own coordinates (an identity of the
    // affine map and its inverse), to rounding.
    const fit = fitCalibration(doc.calibration!);
    if (!fit.ok) throw new Error(fit.message);
    for (const i of [0, 12345, n - 1]) {
      const [x, z] = imageToSection(fit.fit, doc.horizons[11].pointsPx[i]);
      expect(x).toBeCloseTo(section.horizons[11].line![i][0], 6);
      expect(z).toBeCloseTo(section.horizons[11].line![i][1], 6);
    }
    // The pins sit at mid-height of everything drawn: halfway between the lowest and highest elevation.
    const [, zPin] = imageToSection(fit.fit, doc.scenarios[0].pinsPx![0]);
    expect(zPin).toBeCloseTo((-300 * 11 - 100 + 100) / 2, 0);
  });
});
