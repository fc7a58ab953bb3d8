// Builds the demo section (npm run make-demo): an invented fold belt, made with the forward model and
// drawn to public/demo/section.png as if hand-drafted and scanned, with the answer beside it.
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { forwardSection } from '../src/core/forward/forwardSection';
import { demoEnds, demoPlaces, demoSectionName, demoSpec, demoTitle, demoUnits } from './demo/demoSpec';
import { apply, image, invert, rotationDegrees, sectionToImage, verticalExaggeration, window } from './demo/layout';
import { topography } from './demo/topography';
import { renderSvg } from './demo/renderSvg';
import { rasterise } from './demo/rasterise';
import { inkShare } from './demo/checkInk';
import { compactPng } from './demo/compactPng';
import { demoReadme } from './demo/demoReadme';
import { digitiseByHand } from './demo/digitiseByHand';
import { analyseSection } from '../src/core/analysis/analyseSection';
import { faultedSection } from '../src/core/forward/faultedSection';
import type { LineSection } from '../src/core/model/section';
import { digitiseFaultedByHand, FAULT_DEMOS, faultSurface, renderFaultedSvg, type FaultDemo } from './demo/faultDemos';

const outDir = join(dirname(fileURLToPath(import.meta.url)), '..', 'public', 'demo');

async function main(): Promise<void> {
  const { section, truth } = forwardSection(demoSpec);
  const surface = topography(section.horizons[0].line, window.xMin, window.xMax);
  const svg = renderSvg({
    section, surface, units: demoUnits, places: demoPlaces, title: demoTitle, sectionName: demoSectionName, ends: demoEnds,
    labels: [[0, 12900], [1, 5700], [2, 5700], [3, 5700], [4, 5700], [5, 5700], [6, 5700]],
  });
  const png = compactPng(await rasterise(svg, { width: image.width, height: image.height, rotationDegrees, seed: 20260 }), 2);
  const toImage = sectionToImage();
  const toSection = invert(toImage);
  const share = inkShare(png, section, toImage);
  if (share < 0.97) throw new Error(`demo check failed: only ${(share * 100).toFixed(1)}% of horizon points land on ink`);
  const corners: [number, number][] = [[window.xMin, window.zMax], [window.xMax, window.zMax], [window.xMax, window.zMin], [window.xMin, window.zMin], [window.xMin, 0], [window.xMax, 0]];
  const calibration = {
    description: 'Image pixel <-> section mapping of section.png (invented demo). u right, v down, origin at the top-left corner of the image.',
    imageWidthPx: image.width,
    imageHeightPx: image.height,
    units: section.units,
    verticalExaggeration,
    rotationDegrees,
    sectionToImage: { u: [toImage.a, toImage.b, toImage.c], v: [toImage.d, toImage.e, toImage.f] },
    imageToSection: { x: [toSection.a, toSection.b, toSection.c], z: [toSection.d, toSection.e, toSection.f] },
    controlPoints: corners.map(([x, z]) => {
      const [u, v] = apply(toImage, [x, z]);
      return { u, v, x, z };
    }),
  };
  mkdirSync(outDir, { recursive: true });
  writeFileSync(join(outDir, 'section.png'), png);
  // What the user opens is the scan digitised as a person would, not the forward model's exact lines.
  const digitised = digitiseByHand(section, toImage, toSection, surface);
  const result = analyseSection(digitised);
  if (!result.ok || !result.analysis.areaDepth) throw new Error('the digitised demo does not analyse');
  writeFileSync(join(outDir, 'section.json'), JSON.stringify(digitised, null, 1) + '\n');
  writeFileSync(join(outDir, 'truth.json'), JSON.stringify({ units: truth.units, displacement: truth.displacement, detachmentElevation: truth.detachmentElevation }, null, 2) + '\n');
  writeFileSync(join(outDir, 'calibration.json'), JSON.stringify(calibration, null, 2) + '\n');
  writeFileSync(join(outDir, 'README.md'), demoReadme(truth, digitised, result.analysis.areaDepth));
  console.log(`demo written to ${outDir}: ${(png.length / 1e6).toFixed(2)} MB PNG, ${(share * 100).toFixed(1)}% of horizon points on ink`);
  const ad = result.analysis.areaDepth;
  console.log(`digitised: D = ${ad.displacement.toFixed(1)} m, detachment ${ad.detachmentElevation?.toFixed(1)} m, r² = ${ad.r2.toFixed(5)}, 95% ${JSON.stringify(ad.detachmentDepthCI95)}`);
  console.log(`D = ${truth.displacement} m, detachment elevation ${truth.detachmentElevation} m (depth ${truth.detachmentDepth} m below ${truth.referenceElevation} m)`);
  for (const demo of FAULT_DEMOS) await makeFaultDemo(demo, calibration);
}

/** Writes one faulted example to public/demo/<id>/: scan, hand-digitised section, truth and calibration (the first demo's frame). */
async function makeFaultDemo(demo: FaultDemo, calibration: object): Promise<void> {
  const { section, truth } = faultedSection(demo.spec);
  const surface = faultSurface(demo.surfaceLevel);
  const toImage = sectionToImage();
  const toSection = invert(toImage);
  const png = compactPng(await rasterise(renderFaultedSvg(demo, section, surface), { width: image.width, height: image.height, rotationDegrees, seed: demo.seed }), 2);
  // Each piece and the fault as its own line: the ink check must not look for ink across the gap between cutoffs.
  const asLines: LineSection = {
    units: section.units, pins: section.pins,
    horizons: [...section.horizons.flatMap((h) => (h.pieces ?? []).map((line, k) => ({ name: `${h.name} ${k}`, line, regional: h.regional }))),
      ...(section.faults ?? []).map((f) => ({ name: f.name, line: f.line.filter(([x]) => x >= window.xMin && x <= window.xMax), regional: h0(f.line) }))],
  };
  const share = inkShare(png, asLines, toImage);
  if (share < 0.97) throw new Error(`${demo.id} demo check failed: only ${(share * 100).toFixed(1)}% of line points land on ink`);
  const digitised = digitiseFaultedByHand(section, toImage, toSection, demo.seed);
  const result = analyseSection(digitised);
  if (!result.ok || !result.analysis.areaDepth) throw new Error(`the digitised ${demo.id} demo does not analyse`);
  const dir = join(outDir, demo.id);
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, 'section.png'), png);
  writeFileSync(join(dir, 'section.json'), JSON.stringify(digitised, null, 1) + '\n');
  writeFileSync(join(dir, 'truth.json'), JSON.stringify({ units: section.units, displacement: truth.displacement, detachmentElevation: truth.detachmentElevation }, null, 2) + '\n');
  writeFileSync(join(dir, 'calibration.json'), JSON.stringify(calibration, null, 2) + '\n');
  const ad = result.analysis.areaDepth;
  console.log(`${demo.id}: ${(png.length / 1e6).toFixed(2)} MB PNG, ${(share * 100).toFixed(1)}% on ink; digitised D = ${ad.displacement.toFixed(1)} m, detachment ${ad.detachmentElevation?.toFixed(1)} m, r² = ${ad.r2.toFixed(5)}; truth D = ${truth.displacement} m, detachment ${truth.detachmentElevation} m`);
}

/** A stand-in regional for the ink check's fault line (the check reads only the line). */
function h0(line: [number, number][]): [number, number][] {
  return [line[0], line[line.length - 1]];
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : String(err));
  process.exit(1);
});
