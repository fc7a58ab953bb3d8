// The demo drawing as an SVG string (drawing pixels, before the "scan" rotation and noise).
import type { LineSection as Section, XZ } from '../../src/core/model/section';
import { drawingPx, image, pxPerMetre, verticalExaggeration, window } from './layout';
import { highestZAt } from './topography';

export interface DrawingInput {
  section: Section;
  surface: XZ[];
  units: { name: string; colour: string }[];
  places: { name: string; x: number }[];
  /** Unit label positions: [unit index, x (m)]. */
  labels: [number, number][];
  title: string;
  sectionName: string;
  ends: { left: string; right: string; leftCompass: string; rightCompass: string };
}

const LETTER = "'URW Gothic', 'DejaVu Sans', sans-serif";
export const ITALIC = "'URW Bookman', 'DejaVu Serif', serif";
export const INK = '#1d1b19';

const f1 = (v: number): string => v.toFixed(1);
/** A slight, smooth wander of the pen (≤ 0.6 px), the same function everywhere so shared edges still meet. */
function warp([u, v]: [number, number]): [number, number] {
  return [u + 0.55 * Math.sin(v / 37 + 0.8 * Math.sin(u / 53)), v + 0.55 * Math.sin(u / 41 + 0.7 * Math.sin(v / 29))];
}

/** Drawing-pixel points of a section polyline, split into pieces of at most 6 px so the wander shows. */
export function pts(line: XZ[]): string {
  const out: string[] = [];
  const px = line.map(drawingPx);
  px.forEach((p, i) => {
    if (i > 0) {
      const q = px[i - 1];
      const n = Math.ceil(Math.hypot(p[0] - q[0], p[1] - q[1]) / 6);
      for (let k = 1; k < n; k++) out.push(warp([q[0] + ((p[0] - q[0]) * k) / n, q[1] + ((p[1] - q[1]) * k) / n]).map(f1).join(','));
    }
    out.push(warp(p).map(f1).join(','));
  });
  return out.join(' ');
}
const esc = (s: string): string => s.replace(/&/g, '&amp;').replace(/</g, '&lt;');

export function text(u: number, v: number, s: string, size: number, opts: { anchor?: string; font?: string; style?: string; spacing?: number; rotate?: number } = {}): string {
  const rot = opts.rotate ? ` transform="rotate(${opts.rotate} ${f1(u)} ${f1(v)})"` : '';
  return `<text x="${f1(u)}" y="${f1(v)}" font-family="${opts.font ?? LETTER}" font-size="${size}" text-anchor="${opts.anchor ?? 'middle'}"` +
    `${opts.style ? ` font-style="${opts.style}"` : ''}${opts.spacing ? ` letter-spacing="${opts.spacing}"` : ''} fill="${INK}"${rot}>${esc(s)}</text>`;
}

/** Returns the SVG of the demo section (image.width × image.height px, transparent background). */
export function renderSvg(d: DrawingInput): string {
  const [uL, vT] = drawingPx([window.xMin, window.zMax]);
  const [uR, vB] = drawingPx([window.xMax, window.zMin]);
  const below = (line: XZ[]): string => pts([...line, [window.xMax, window.zMin - 200], [window.xMin, window.zMin - 200]]);
  const lines = d.section.horizons.map((h) => h.line);
  const fills = [d.surface, ...lines].map((l, i) => `<polygon points="${below(l)}" fill="${d.units[i].colour}"/>`).join('');
  const ink = lines.map((l) => `<polyline points="${pts(l)}" fill="none" stroke="${INK}" stroke-width="2.3" stroke-linejoin="round"/>`).join('');
  // Where erosion has cut a horizon, the eroded part is drawn in the air above the land surface as a dashed,
  // projected line, as geologists draw it; below the surface the ink is solid and the units coloured.
  const projected = lines.map((l) => `<polyline points="${pts(l)}" fill="none" stroke="${INK}" stroke-width="1.8" stroke-dasharray="14 7" stroke-linejoin="round"/>`).join('');
  const above = pts([[window.xMin, window.zMax + 200], ...d.surface, [window.xMax, window.zMax + 200]]);
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${image.width}" height="${image.height}" viewBox="0 0 ${image.width} ${image.height}">`);
  out.push(`<defs><clipPath id="frame"><rect x="${uL}" y="${vT}" width="${uR - uL}" height="${vB - vT}"/></clipPath>
<filter id="wash" x="0" y="0" width="100%" height="100%"><feTurbulence type="fractalNoise" baseFrequency="0.011 0.02" numOctaves="4" seed="5" result="t"/>
<feColorMatrix in="t" type="matrix" values="0 0 0 0 1  0 0 0 0 1  0 0 0 0 1  0 0 0 -1.6 1.05"/></filter>
<clipPath id="ground"><polygon points="${below(d.surface)}"/></clipPath><clipPath id="air"><polygon points="${above}"/></clipPath></defs>`);
  out.push(`<g clip-path="url(#frame)"><g clip-path="url(#ground)">${fills}<rect x="${uL}" y="${vT}" width="${uR - uL}" height="${vB - vT}" filter="url(#wash)" opacity="0.55"/>${ink}</g>`);
  out.push(`<g clip-path="url(#air)">${projected}</g><polyline points="${pts(d.surface)}" fill="none" stroke="${INK}" stroke-width="3"/></g>`);
  out.push(`<rect x="${uL}" y="${vT}" width="${uR - uL}" height="${vB - vT}" fill="none" stroke="${INK}" stroke-width="2.2"/>`);
  out.push(axes(uL, uR, vB));
  out.push(unitLabels(d));
  out.push(placeNames(d));
  out.push(furniture(d, uL, uR, vT, vB));
  out.push('</svg>');
  return out.join('\n');
}

export function axes(uL: number, uR: number, vB: number): string {
  const out: string[] = [];
  for (let z = Math.ceil(window.zMin / 500) * 500; z <= window.zMax; z += 500) {
    const v = drawingPx([0, z])[1];
    const major = z % 1000 === 0;
    const len = major ? 14 : 8;
    out.push(`<path d="M${uL} ${f1(v)}h${-len}M${uR} ${f1(v)}h${len}" stroke="${INK}" stroke-width="1.8"/>`);
    if (major) {
      const label = z === 0 ? 'S.L.' : z < 0 ? `−${-z}` : `${z}`;
      out.push(text(uL - 20, v + 8, label, 22, { anchor: 'end' }), text(uR + 20, v + 8, label, 22, { anchor: 'start' }));
    }
  }
  for (let x = window.xMin; x <= window.xMax; x += 1000) {
    const u = drawingPx([x, 0])[0];
    const major = x % 2000 === 0;
    out.push(`<path d="M${f1(u)} ${vB}v${major ? 14 : 8}" stroke="${INK}" stroke-width="1.8"/>`);
    if (major) out.push(text(u, vB + 38, `${x / 1000}`, 22));
  }
  const vMid = (drawingPx([0, window.zMax])[1] + vB) / 2;
  out.push(text(uL - 100, vMid, 'Elevation (m)', 23, { rotate: -90 }), text(uR + 106, vMid, 'Elevation (m)', 23, { rotate: 90 }));
  out.push(text((uL + uR) / 2, vB + 68, 'Distance along section (km)', 23));
  return out.join('');
}

function unitLabels(d: DrawingInput): string {
  const lines = [d.surface, ...d.section.horizons.map((h) => h.line)];
  return d.labels.map(([k, x]) => {
    const top = highestZAt(lines[k], x);
    const bottom = k + 1 < lines.length ? highestZAt(lines[k + 1], x) : window.zMin;
    const [u, v] = drawingPx([x, (top + bottom) / 2]);
    return text(u, v + 8, d.units[k].name, 23, { font: ITALIC, style: 'italic' });
  }).join('');
}

function placeNames(d: DrawingInput): string {
  return d.places.map(({ name, x }) => {
    const [u, v] = drawingPx([x, highestZAt(d.surface, x)]);
    return `${text(u, v - 46, name, 22, { spacing: 3 })}<path d="M${f1(u)} ${f1(v - 38)}V${f1(v - 8)}" stroke="${INK}" stroke-width="1.5"/>`;
  }).join('');
}

export function furniture(d: DrawingInput, uL: number, uR: number, vT: number, vB: number): string {
  const out: string[] = [];
  out.push(text(image.width / 2, 62, d.title, 42, { spacing: 6 }));
  out.push(text(image.width / 2, 100, d.sectionName, 26, { spacing: 4 }));
  out.push(text(uL, vT - 30, d.ends.left, 40, { anchor: 'start' }), text(uL + 44, vT - 30, d.ends.leftCompass, 24, { anchor: 'start' }));
  out.push(text(uR, vT - 30, d.ends.right, 40, { anchor: 'end' }), text(uR - 52, vT - 30, d.ends.rightCompass, 24, { anchor: 'end' }));
  // Scale bar: 5 km in 1 km blocks, at the drawing's horizontal scale.
  const km = 1000 * pxPerMetre;
  const v0 = vB + 104;
  for (let i = 0; i < 5; i++) {
    out.push(`<rect x="${f1(uL + i * km)}" y="${v0}" width="${f1(km)}" height="11" fill="${i % 2 ? '#fbf7ec' : INK}" stroke="${INK}" stroke-width="1.6"/>`);
    out.push(text(uL + i * km, v0 + 36, `${i}`, 20));
  }
  out.push(text(uL + 5 * km, v0 + 36, '5 km', 20));
  out.push(text(uL + 5 * km + 60, v0 + 12, `Vertical exaggeration ${verticalExaggeration}:1`, 24, { anchor: 'start' }));
  out.push(text(uR, v0 + 12, 'Invented example for Foldroot — no real place, formation or published section', 18, { anchor: 'end', font: ITALIC, style: 'italic' }));
  return out.join('');
}
