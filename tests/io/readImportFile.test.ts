// Reading a horizon file through the reading worker's path (read, parse, measure, pack, unpack in steps) gives what the
// parsers give from the same text — horizons, pieces, faults, problems, messages — with each line's extent and the
// range check the preview shows. Under Node there is no Worker, so the same steps run in this thread.
import { describe, expect, it } from 'vitest';
import { parseHorizonsCsv, writeHorizonsCsv } from '../../src/io/csvHorizons';
import { parseHorizonsGeoJson, writeHorizonsGeoJson } from '../../src/io/geojsonHorizons';
import { importReadForTransfer, lineBox, readImportText } from '../../src/io/importedForTransfer';
import { readImportFile, type ImportProgress } from '../../src/io/readImportFile';
import { readSvgLines } from '../../src/io/svgHorizons';
import { importedCoordinateProblem } from '../../src/core/model/importedCoordinateProblem';

// An invented section: a long folded horizon, one cut by a fault into two pieces, and the fault.
const N = 151_000;
const long = Array.from({ length: N }, (_, i): [number, number] => [i / 20, 300 + 40 * Math.sin(i / 5000)]);
const pieces: [number, number][][] = [[[0, 100], [4000, 120]], [[4100, 60], [10000, 80]]];
const horizons = [{ name: 'Upper marker', line: long }, { name: 'Cut bed', line: pieces.flat(), pieces }];
const faults = [{ name: 'Main fault', line: [[4000, 400], [4100, -200]] as [number, number][] }];

describe('readImportFile', () => {
  it('reads a CSV as parseHorizonsCsv does, unpacking its lines in steps, with extents and the range check', async () => {
    const text = writeHorizonsCsv(horizons, 'm', faults);
    const heard: ImportProgress[] = [];
    const read = await readImportFile(new File([text], 'big.csv'), 'csv', (p) => heard.push(p));
    const direct = parseHorizonsCsv(text);
    if (read === 'unreadable' || read === 'cancelled' || read.kind === 'svg' || !direct.ok) throw new Error('not read');
    expect(read.result).toEqual(direct);
    expect(read.boxes).toEqual(direct.horizons.map((h) => lineBox(h.line)));
    expect(read.boxes[0]).toEqual([0, (N - 1) / 20, 260, 340]);
    expect(read.rangeProblem).toBeNull();
    expect(heard.slice(0, 2)).toEqual([{ stage: 'reading' }, { stage: 'checking' }]);
    // 151,000 + 8 vertices at 150,000 a step: one step before the end.
    expect(heard.filter((p) => p.stage === 'lines').length).toBeGreaterThanOrEqual(1);
  });

  it('reads GeoJSON and SVG as their parsers do, and a refusal with its message', async () => {
    const geo = writeHorizonsGeoJson(horizons.slice(1), 'ft', faults);
    const g = await readImportFile(new File([geo], 'a.geojson'), 'geojson');
    if (g === 'unreadable' || g === 'cancelled') throw new Error('not read');
    expect(g.result).toEqual(parseHorizonsGeoJson(geo));
    const svg = '<svg xmlns="http://www.w3.org/2000/svg"><path id="Top" d="M0 10 L50 20 L100 5"/><polyline points="0,50 100,60"/></svg>';
    const s = await readImportFile(new File([svg], 'a.svg'), 'svg');
    if (s === 'unreadable' || s === 'cancelled') throw new Error('not read');
    expect(s.result).toEqual(readSvgLines(svg));
    expect(s.boxes).toEqual([[0, 100, 5, 20], [0, 100, 50, 60]]);
    const bad = await readImportFile(new File(['x,y\n1,2'], 'bad.csv'), 'csv');
    if (bad === 'unreadable' || bad === 'cancelled') throw new Error('not read');
    expect(bad.result).toEqual(parseHorizonsCsv('x,y\n1,2'));
    expect(bad.result.ok).toBe(false);
  });

  it('names a coordinate out of range as the section opener does', () => {
    const text = 'horizon,x_m,z_m\nFar,0,0\nFar,1e12,5\n';
    const read = readImportText('csv', text);
    const direct = parseHorizonsCsv(text);
    if (read.kind === 'svg' || !direct.ok) throw new Error('not read');
    expect(read.rangeProblem).toBe(importedCoordinateProblem(direct.horizons));
    expect(read.rangeProblem).toContain('vertex 2');
  });

  it('transfers each buffer once, even when one line is the same array twice', () => {
    const shared: [number, number][] = [[0, 0], [1, 1]];
    const read = readImportText('csv', writeHorizonsCsv([{ name: 'A', line: shared }], 'm'));
    if (read.kind === 'svg' || !read.result.ok) throw new Error('not read');
    read.result.horizons.push({ name: 'B', line: read.result.horizons[0].line });
    const { transfer } = importReadForTransfer(read);
    expect(new Set(transfer).size).toBe(transfer.length);
    expect(transfer.length).toBe(1);
  });
});
