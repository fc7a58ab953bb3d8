import { describe, expect, it } from 'vitest';
import { fitCalibration } from '../../../../src/core/calibration/fitCalibration';
import { imageToSection } from '../../../../src/core/calibration/mapPoints';
import { importHorizons } from '../../../../src/core/model/commands/importHorizons';
import { emptyProjectDoc, type ProjectDoc } from '../../../../src/core/model/projectDoc';

function inSection(doc: ProjectDoc, i: number) {
  const fit = fitCalibration(doc.calibration!);
  if (!fit.ok) throw new Error(fit.message);
  return doc.horizons[i].pointsPx.map((p) => imageToSection(fit.fit, p));
}

describe('importHorizons(doc, horizons, units)', () => {
  it('gives an uncalibrated document a canvas and returns the same section coordinates', () => {
    const line: [number, number][] = [[0, -200], [350, 120], [800, -50]];
    const doc = importHorizons(emptyProjectDoc(), [{ name: 'Top', line }], 'ft');
    expect(doc.units).toBe('ft');
    inSection(doc, 0).forEach((q, i) => {
      expect(q[0]).toBeCloseTo(line[i][0], 9);
      expect(q[1]).toBeCloseTo(line[i][1], 9);
    });
  });

  it('converts feet to the document metres (1 ft = 0.3048 m exactly, international foot) and renames clashes', () => {
    const base = importHorizons(emptyProjectDoc(), [{ name: 'Top', line: [[0, 0], [1000, 100]] }], 'm');
    const doc = importHorizons(base, [{ name: 'Top', line: [[0, 0], [1000, 0]] }], 'ft');
    expect(doc.horizons.map((h) => h.name)).toEqual(['Top', 'Top (2)']);
    expect(new Set(doc.horizons.map((h) => h.id)).size).toBe(2);
    expect(inSection(doc, 1)[1][0]).toBeCloseTo(304.8, 9);
  });

  it('returns the same document for nothing usable', () => {
    const doc = emptyProjectDoc();
    expect(importHorizons(doc, [{ name: 'one point', line: [[0, 0]] }], 'm')).toBe(doc);
  });
});
