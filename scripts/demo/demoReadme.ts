// The README written beside the demo files.
import type { ForwardTruth } from '../../src/core/forward/forwardSpec';
import type { AreaDepthResult } from '../../src/core/analysis/fitAreaDepth';
import type { LineSection as Section } from '../../src/core/model/section';
import { DEMO_HAND } from './digitiseByHand';
import { DEMO_EROSION } from './topography';

/** Returns which horizons carry projected runs and how many vertices they hold, in words. */
function projectedNote(digitised: Section): string {
  const parts = digitised.horizons.flatMap((h) => (h.projected?.length
    ? [`"${h.name}", vertices ${h.projected.map(([a, b]) => `${a}–${b}`).join(', ')}`]
    : []));
  return parts.length ? parts.join('; ') : 'no horizon';
}

/** Returns public/demo/README.md for the given truth, the digitised section and its area–depth answer. */
export function demoReadme(truth: ForwardTruth, digitised: Section, answer: AreaDepthResult): string {
  const f = (v: number | null | undefined, d = 0) => (v === null || v === undefined ? '—' : v.toFixed(d));
  const ci = answer.detachmentDepthCI95;
  const inside = (c: [number, number] | null, t: ForwardTruth): boolean => c !== null && c[0] < t.detachmentDepth && t.detachmentDepth < c[1];
  return `# Demo section (invented)

Everything here is invented for Foldroot: the Corrowan Fold Belt, Section F–F′, the ridge and valley
names and the unit names (Harrel Beds, Vennick Sandstone, …) are made up. No real place, formation or
published section is shown. Rebuild with \`npm run make-demo\` (scripts/makeDemo.ts, scripts/demo/).

The section was built with the forward model (src/core/forward): six horizons above one detachment,
each with excess area exactly D · (regional elevation − detachment elevation) (Epard & Groshong 1993),
folded as a box anticline, a syncline below the regional, an east-verging overturned anticline and a
small rounded anticline, over a gently curved regional. The detachment is not drawn. Erosion has cut the
land surface down through the crest of the overturned anticline (about ${f(DEMO_EROSION.centre - DEMO_EROSION.halfWidth)}–${f(DEMO_EROSION.centre + DEMO_EROSION.halfWidth)} m along
the section, to about ${f(DEMO_EROSION.level)} m): there the top horizon is drawn as a dashed projected line in the air
above the land surface, as geologists draw an eroded crest, and its digitised line marks that stretch
projected (${projectedNote(digitised)}). The truth is the forward model's and is unchanged by erosion: the
projected crest carries the same excess area as the model's line.

The scan is drawn from those exact lines, but section.json holds them as a person digitises the scan
(scripts/demo/digitiseByHand.ts): a click every ${DEMO_HAND.spacingPx} scan pixels along each line (about 250 m)
and at every bend sharper than ${DEMO_HAND.bendDeg}°, each off the ink by seeded Gaussian jitter of
${DEMO_HAND.jitterPx} px in both directions, read back through the calibration. The regionals and pins are
the model's. So the demo shows what real digitising gives: r² = ${f(answer.r2, 5)}, a detachment at
${f(answer.detachmentElevation)} m (${f(answer.detachmentDepth)} m below the reference; 95% interval
${ci ? `${f(ci[0])}–${f(ci[1])} m` : 'none'}) and a displacement of ${f(answer.displacement)} m, against the
truth of ${truth.detachmentElevation} m and ${truth.displacement} m. The answer is ${f(Math.abs((answer.detachmentElevation ?? 0) - truth.detachmentElevation))} m off in
depth and ${f(Math.abs(answer.displacement - truth.displacement))} m in displacement, for two reasons: the jitter scatters each
excess area a little, and straight segments between clicks cut across the curved crests and troughs, so every
fold loses a sliver of area (more in the tight overturned fold and its projected crest); both are the digitising
error of any hand-made section, and the truth lies ${inside(ci, truth) ? 'inside' : 'outside'} the 95% interval.

| file | what it holds |
| --- | --- |
| section.png | the drawing, ${'2400 × 1200'} px, styled as a scanned hand-drafted section: vertical exaggeration 2:1, turned ${'0.4°'} clockwise, with paper tone and scan noise |
| section.json | the scan digitised by hand (seeded) in section units (metres), plain section format (units, pins, horizons with line and regional) |
| truth.json | \`{ units, displacement, detachmentElevation }\`: D = ${truth.displacement} m, detachment at ${truth.detachmentElevation} m (${truth.detachmentDepth} m below the highest regional, ${truth.referenceElevation} m) |
| calibration.json | the mapping between image pixels and section coordinates, both directions, and control points |

## The faulted examples: thrust/ and normal/

Two more invented sections, opened from *Project ▾ → Invented examples*: \`thrust/\` (the Brennock Thrust
Sheet, a thrust sheet carried up a ramp from a lower flat onto an upper flat, four horizons cut by the
thrust) and \`normal/\` (the Orvane Basin Margin, a hanging wall slid down a normal fault onto a flat, four
horizons cut, area lost below the regionals). Each is built with the faulted forward model (vertical simple
shear over the fault, src/core/forward/faultedSection.ts), drawn as a scanned figure and digitised by hand
the same way as the fold belt, fault included; each piece's end at the fault lies on the digitised fault,
as the app's snapping puts it. Each folder holds the same four files as this one, its section.json with
\`faults\` and horizons in \`pieces\`. README.md at the top of the repository gives each answer against its truth.

## calibration.json

Image pixels: \`u\` to the right, \`v\` down, origin at the top-left corner of the image (pixel (i, j) covers
[i, i+1) × [j, j+1), so its centre is (i + 0.5, j + 0.5)). Section: \`x\` horizontal distance, \`z\` elevation (m).

- \`sectionToImage\`: \`u = u[0]·x + u[1]·z + u[2]\`, \`v = v[0]·x + v[1]·z + v[2]\`.
- \`imageToSection\`: \`x = x[0]·u + x[1]·v + x[2]\`, \`z = z[0]·u + z[1]·v + z[2]\` (the exact inverse).
- \`controlPoints\`: \`{ u, v, x, z }\` at the frame corners and at sea level on both frame edges — marks that
  can be seen on the image, usable as an affine calibration with three or more points.

The mapping is the drawing's scale (0.08 px per metre across, 0.16 px per metre up: vertical
exaggeration 2) followed by the rotation θ = 0.4° about the image centre (cx, cy) = (1200, 600):
\`u = cx + cos θ (u0 − cx) − sin θ (v0 − cy)\`, \`v = cy + sin θ (u0 − cx) + cos θ (v0 − cy)\`, where (u0, v0) is the
unrotated drawing position. To draw section.json on the image, apply \`sectionToImage\` to every vertex.

## Cautions

Depth-to-detachment estimates are interpretations. They depend on the regional, the pins, plane strain
and area conservation; they are non-unique and must be checked against wells, seismic and balanced
restorations. Where they inform drilling, tunnelling, foundations, storage or hazard work, the decision
belongs to a licensed professional under local codes.
`;
}
