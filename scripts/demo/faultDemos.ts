// The two faulted examples (npm run make-demo): a thrust sheet carried up a ramp and a normal fault
// whose hanging wall has slid down it, each built with the faulted forward model
// (src/core/forward/faultedSection.ts), drawn as a scanned figure on the first demo's frame and
// digitised like a person. Every name here is invented.
import type { FaultedSpec } from '../../src/core/forward/faultedSection';
import type { Section, XZ } from '../../src/core/model/section';
import { seededRandom } from '../../src/core/stats/seededRandom';
import { nearestOnPolyline } from '../../src/core/geometry/nearestOnPolyline';
import { apply, drawingPx, image, window, type Affine } from './layout';
import { axes, furniture, INK, ITALIC, pts, text, type DrawingInput } from './renderSvg';
import { clicksAlong, DEMO_HAND, type HandOptions } from './digitiseByHand';
import { highestZAt } from './topography';

export interface FaultDemo {
  /** Folder under public/demo/ and the id the app opens it by. */
  id: 'thrust' | 'normal';
  spec: FaultedSpec;
  units: { name: string; colour: string }[];
  title: string;
  sectionName: string;
  ends: DrawingInput['ends'];
  /** Where the fault's name is written (x, z in section units). */
  faultLabel: XZ;
  /** Land-surface elevation above the section (m) and the seed of the hand that digitises it. */
  surfaceLevel: number;
  seed: number;
}

/** A thrust sheet carried 1600 m up a 29° ramp from a flat at −2400 m to an upper flat near 900 m. */
export const THRUST_DEMO: FaultDemo = {
  id: 'thrust',
  spec: {
    units: 'm',
    pins: [2000, 24000],
    displacement: 1600,
    fault: [[-2000, -2400], [8000, -2400], [14000, 900], [19000, 1000]],
    faultName: 'Brennock Thrust',
    extent: [0, 26000],
    horizons: [
      { name: 'Top Carrabel Sandstone', regionalElevation: 600 },
      { name: 'Top Oskery Limestone', regionalElevation: 0 },
      { name: 'Top Pendrith Shale', regionalElevation: -800 },
      { name: 'Top Vaulk Siltstone', regionalElevation: -1600 },
    ],
  },
  units: [
    { name: 'Tellwyn Mudstone', colour: '#efe2a6' },
    { name: 'Carrabel Sandstone', colour: '#e9c27d' },
    { name: 'Oskery Limestone', colour: '#9fc3d6' },
    { name: 'Pendrith Shale', colour: '#a9b0a0' },
    { name: 'Vaulk Siltstone', colour: '#e0a98f' },
  ],
  title: 'BRENNOCK THRUST SHEET',
  sectionName: 'SECTION T–T′',
  ends: { left: 'T', right: 'T′', leftCompass: 'W', rightCompass: 'E' },
  faultLabel: [15800, 1250],
  surfaceLevel: 1900,
  seed: 2718,
};

/** A normal fault: the hanging wall has slid 1400 m down a 39° ramp onto a flat at −2200 m. */
export const NORMAL_DEMO: FaultDemo = {
  id: 'normal',
  spec: {
    units: 'm',
    pins: [2000, 24000],
    displacement: -1400,
    fault: [[-2000, -2200], [9000, -2200], [15000, 2600]],
    faultName: 'Grellan Fault',
    extent: [0, 26000],
    horizons: [
      { name: 'Top Ombry Sandstone', regionalElevation: 1000 },
      { name: 'Top Varrow Chalk', regionalElevation: 300 },
      { name: 'Top Tissen Marl', regionalElevation: -500 },
      { name: 'Top Cladwen Sandstone', regionalElevation: -1300 },
    ],
  },
  units: [
    { name: 'Sellick Clays', colour: '#efe2a6' },
    { name: 'Ombry Sandstone', colour: '#e9c27d' },
    { name: 'Varrow Chalk', colour: '#b9cf9a' },
    { name: 'Tissen Marl', colour: '#c7aed3' },
    { name: 'Cladwen Sandstone', colour: '#e0a98f' },
  ],
  title: 'ORVANE BASIN MARGIN',
  sectionName: 'SECTION N–N′',
  ends: { left: 'N', right: 'N′', leftCompass: 'NW', rightCompass: 'SE' },
  faultLabel: [14600, 1500],
  surfaceLevel: 1700,
  seed: 4451,
};

export const FAULT_DEMOS: FaultDemo[] = [THRUST_DEMO, NORMAL_DEMO];

/** Returns a gently rolling land surface at about `level` m across the window. */
export function faultSurface(level: number, step = 100): XZ[] {
  const out: XZ[] = [];
  for (let x = window.xMin; x <= window.xMax + 1e-9; x += step) out.push([x, level + 90 * Math.sin(x / 1700) ** 2 + 50 * Math.sin(x / 730 + 0.6)]);
  return out;
}

/** The fault run out flat to both window edges, so it can bound the hanging and footwall regions. */
function faultAcross(fault: XZ[]): XZ[] {
  const first = fault[0], last = fault[fault.length - 1];
  return [[Math.min(window.xMin - 500, first[0]), first[1]], ...fault, [Math.max(window.xMax + 500, last[0]), last[1]]];
}

/** Returns the SVG of a faulted example: units coloured on each side of the fault, the fault in heavy ink. */
export function renderFaultedSvg(demo: FaultDemo, section: Section, surface: XZ[]): string {
  const [uL, vT] = drawingPx([window.xMin, window.zMax]);
  const [uR, vB] = drawingPx([window.xMax, window.zMin]);
  const lo = window.zMin - 400, hi = window.zMax + 400;
  const fault = faultAcross(section.faults?.[0]?.line ?? []);
  const [xa, xb] = [window.xMin - 500, window.xMax + 500];
  const below = (line: XZ[]): string => pts([...line, [xb, lo], [xa, lo]]);
  const fills: string[] = [`<polygon points="${below(surface)}" fill="${demo.units[0].colour}"/>`];
  const hanging: string[] = [];
  const foot: string[] = [];
  const inks: string[] = [];
  section.horizons.forEach((h, i) => {
    const [hw, fw] = h.pieces ?? [];
    const c = demo.units[i + 1].colour;
    // Hanging wall: below its piece, run out level from the cutoff (beneath the fault, so clipped away).
    const end = hw[hw.length - 1];
    hanging.push(`<polygon points="${below([[xa, hw[0][1]], ...hw, [xb, end[1]]])}" fill="${c}"/>`);
    foot.push(`<polygon points="${below([[xa, fw[1][1]], [xb, fw[1][1]]])}" fill="${c}"/>`);
    for (const p of [hw, fw]) inks.push(`<polyline points="${pts(p)}" fill="none" stroke="${INK}" stroke-width="2.3" stroke-linejoin="round"/>`);
  });
  const aboveFault = pts([...fault, [xb, hi], [xa, hi]]);
  const belowFault = pts([...fault, [xb, lo], [xa, lo]]);
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${image.width}" height="${image.height}" viewBox="0 0 ${image.width} ${image.height}">`);
  out.push(`<defs><clipPath id="frame"><rect x="${uL}" y="${vT}" width="${uR - uL}" height="${vB - vT}"/></clipPath>
<filter id="wash" x="0" y="0" width="100%" height="100%"><feTurbulence type="fractalNoise" baseFrequency="0.011 0.02" numOctaves="4" seed="7" result="t"/>
<feColorMatrix in="t" type="matrix" values="0 0 0 0 1  0 0 0 0 1  0 0 0 0 1  0 0 0 -1.6 1.05"/></filter>
<clipPath id="ground"><polygon points="${below(surface)}"/></clipPath><clipPath id="hw"><polygon points="${aboveFault}"/></clipPath><clipPath id="fw"><polygon points="${belowFault}"/></clipPath></defs>`);
  out.push(`<g clip-path="url(#frame)"><g clip-path="url(#ground)">${fills.join('')}<g clip-path="url(#hw)">${hanging.join('')}</g><g clip-path="url(#fw)">${foot.join('')}</g>`);
  out.push(`<rect x="${uL}" y="${vT}" width="${uR - uL}" height="${vB - vT}" filter="url(#wash)" opacity="0.55"/>${inks.join('')}`);
  out.push(`<polyline points="${pts(section.faults?.[0]?.line ?? [])}" fill="none" stroke="${INK}" stroke-width="4.2" stroke-linejoin="round"/></g>`);
  out.push(`<polyline points="${pts(surface)}" fill="none" stroke="${INK}" stroke-width="3"/></g>`);
  out.push(`<rect x="${uL}" y="${vT}" width="${uR - uL}" height="${vB - vT}" fill="none" stroke="${INK}" stroke-width="2.2"/>`);
  out.push(axes(uL, uR, vB));
  const [fu, fv] = drawingPx(demo.faultLabel);
  out.push(text(fu, fv, demo.spec.faultName ?? 'Fault', 24, { font: ITALIC, style: 'italic', anchor: 'start' }));
  // Unit names in the footwall, right of every cutoff, midway between their top and the next horizon.
  const xLabel = 21500;
  const tops = [highestZAt(surface, xLabel), ...demo.spec.horizons.map((h) => h.regionalElevation), window.zMin];
  demo.units.forEach((u, k) => {
    const [lu, lv] = drawingPx([xLabel, (tops[k] + tops[k + 1]) / 2]);
    out.push(text(lu, lv + 8, u.name, 23, { font: ITALIC, style: 'italic' }));
  });
  out.push(furniture({ title: demo.title, sectionName: demo.sectionName, ends: demo.ends } as DrawingInput, uL, uR, vT, vB));
  out.push('</svg>');
  return out.join('\n');
}

/** Returns the fault and every horizon piece as a person digitises them from the scan: clicks every so many pixels with
 *  seeded jitter, except that a piece's end at the fault is snapped onto the digitised fault, as the app's snapping writes it. */
export function digitiseFaultedByHand(section: Section, toImage: Affine, toSection: Affine, seed: number, o: HandOptions = DEMO_HAND): Section {
  const rnd = seededRandom(seed);
  const round = (v: number) => Math.round(v * 100) / 100;
  const jitter = ([u, v]: [number, number]): [number, number] => [u + o.jitterPx * rnd.normal(), v + o.jitterPx * rnd.normal()];
  const back = (p: [number, number]): XZ => {
    const [x, z] = apply(toSection, p);
    return [round(x), round(z)];
  };
  const faults = (section.faults ?? []).map((f) => {
    const px = f.line.map((q) => apply(toImage, q));
    return { name: f.name, clicks: clicksAlong(px, px.map(() => false), o).map(jitter) };
  });
  const faultPx = faults[0]?.clicks ?? [];
  const snap = (p: [number, number]): [number, number] => {
    const near = nearestOnPolyline(faultPx.map((q) => q[0]), faultPx.map((q) => q[1]), p[0], p[1]);
    if (!near) throw new Error('digitiseFaultedByHand: the section has no fault to snap to');
    const [a, b] = [faultPx[near.segment], faultPx[near.segment + 1]];
    return [a[0] + near.t * (b[0] - a[0]), a[1] + near.t * (b[1] - a[1])];
  };
  return {
    ...section,
    faults: faults.map((f) => ({ name: f.name, line: f.clicks.map(back) })),
    horizons: section.horizons.map((h) => {
      const pieces = h.pieces ?? [];
      return {
        ...h,
        pieces: pieces.map((piece, k) => {
          const px = piece.map((q) => apply(toImage, q));
          const clicks = clicksAlong(px, px.map(() => false), o).map((c, i, all) => {
            const atFault = (k > 0 && i === 0) || (k + 1 < pieces.length && i === all.length - 1);
            return atFault ? snap(c) : jitter(c);
          });
          return clicks.map(back);
        }),
      };
    }),
  };
}
