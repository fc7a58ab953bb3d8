// Horizons cut by faults and the faults themselves leave and come back through CSV and GeoJSON: the pieces,
// the faults and the joins (found again on the fault both piece ends lie on). The section is the faulted
// forward model (vertical simple shear over a ramp-flat fault; Gibbs 1983, J. Struct. Geol. 5).
import { describe, expect, it } from 'vitest';
import { fitCalibration } from '../../src/core/calibration/fitCalibration';
import { imageToSection } from '../../src/core/calibration/mapPoints';
import { importHorizons } from '../../src/core/model/commands/importHorizons';
import { faultedSection } from '../../src/core/forward/faultedSection';
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import { emptyProjectDoc, type ProjectDoc } from '../../src/core/model/projectDoc';
import type { XZ } from '../../src/core/model/section';
import { parseHorizonsCsv, writeHorizonsCsv } from '../../src/io/csvHorizons';
import { docFaultsInSection, docHorizonsInSection } from '../../src/io/exportTables';
import { parseHorizonsGeoJson, writeHorizonsGeoJson } from '../../src/io/geojsonHorizons';
import type { HorizonImport } from '../../src/io/importTypes';

const fault: XZ[] = [[-6000, -2500], [5000, -2500], [7000, -1000], [8500, 600], [30000, 600]];
const { section } = faultedSection({
  units: 'm', pins: [0, 16000], displacement: 1200, fault, faultName: 'Lower ramp',
  horizons: [{ name: 'Upper bed', regionalElevation: 200 }, { name: 'Lower bed', regionalElevation: -1400 }],
});
const doc = sectionToProjectDoc(section, 'Ramp');

function sectionPoints(d: ProjectDoc, px: [number, number][]): XZ[] {
  const fit = fitCalibration(d.calibration!);
  if (!fit.ok) throw new Error(fit.message);
  return px.map((p) => imageToSection(fit.fit, p));
}

function checkRoundTrip(read: HorizonImport) {
  if (!read.ok) throw new Error(read.message);
  expect(read.faults?.map((f) => f.name)).toEqual(['Lower ramp']);
  const back = importHorizons(emptyProjectDoc(), read.horizons, read.units ?? 'm', read.faults ?? []);
  expect(back.faults.map((f) => [f.id, f.name])).toEqual([['fault-1', 'Lower ramp']]);
  back.horizons.forEach((h, i) => {
    const pieces = section.horizons[i].pieces!;
    expect(h.joins).toEqual([{ at: pieces[0].length, faultId: 'fault-1' }]);
    // Every vertex where it was, to the files' 1e-6 unit grid.
    sectionPoints(back, h.pointsPx).forEach(([x, z], k) => {
      const [ex, ez] = pieces.flat()[k];
      expect(Math.abs(x - ex)).toBeLessThan(1e-5);
      expect(Math.abs(z - ez)).toBeLessThan(1e-5);
    });
  });
}

describe('faults and pieces through CSV and GeoJSON', () => {
  it('writes a pieced horizon as a MultiLineString and a fault as a LineString marked as a fault, and reads them back', () => {
    const text = writeHorizonsGeoJson(docHorizonsInSection(doc), 'm', docFaultsInSection(doc));
    const json = JSON.parse(text);
    expect(json.features.map((f: { geometry: { type: string }; properties: { kind: string } }) => [f.geometry.type, f.properties.kind]))
      .toEqual([['MultiLineString', 'horizon'], ['MultiLineString', 'horizon'], ['LineString', 'fault']]);
    checkRoundTrip(parseHorizonsGeoJson(text));
  });

  it('writes pieces and faults in the piece and kind columns of the CSV and reads them back', () => {
    const text = writeHorizonsCsv(docHorizonsInSection(doc), 'm', docFaultsInSection(doc));
    expect(text.split('\r\n')[1]).toBe('horizon,x_m,z_m,piece,kind');
    expect(text).toContain(',2,horizon');
    expect(text).toMatch(/Lower ramp,[-\d.]+,[-\d.]+,,fault/);
    checkRoundTrip(parseHorizonsCsv(text));
  });

  it('reads an old three-column CSV as before: one unbroken line per horizon', () => {
    const r = parseHorizonsCsv('horizon,x_m,z_m\nA,0,0\nA,10,1\n');
    if (!r.ok) throw new Error(r.message);
    expect(r.horizons).toEqual([{ name: 'A', line: [[0, 0], [10, 1]] }]);
    expect(r.faults).toBeUndefined();
  });

  it('lists a piece of one vertex and an unknown kind as problems', () => {
    const r = parseHorizonsCsv('horizon,x_m,z_m,piece,kind\nA,0,0,1,horizon\nA,10,1,1,horizon\nA,12,1,2,horizon\nB,0,0,1,bed\nB,1,0,1,horizon\nB,2,0,1,horizon\n');
    if (!r.ok) throw new Error(r.message);
    expect(r.problems.map((p) => p.message)).toEqual(['kind must be "horizon" or "fault" (got "bed")', 'piece 2 has fewer than two vertices; a piece needs at least two']);
  });
});
