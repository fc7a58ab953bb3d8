// The text of the small readout beside the pointer while a regional handle or a pin is dragged: the
// dragged point's section position, found by comparing the document with the gesture's start snapshot.
import { imageToSection } from '../core/calibration/mapPoints';
import { sectionFrame } from '../core/model/commands/sectionFrame';
import { activeScenario } from '../core/model/docToSection';
import type { ImagePx, ProjectDoc } from '../core/model/projectDoc';
import { formatFixed, MINUS } from '../format/formatQuantity';
import { stepDecimals } from '../format/niceTicks';


/** Returns v as formatFixed writes it, with "+" before a positive value when `signed`. */
function fixed(v: number, decimals: number, signed = false): string {
  const text = formatFixed(v, decimals);
  // A value that rounds to zero ("0.0") takes no sign.
  return signed && !text.startsWith(MINUS) && /[1-9]/.test(text) ? `+${text}` : text;
}

const moved = (a: ImagePx, b: ImagePx) => a[0] !== b[0] || a[1] !== b[1];

/**
 * Returns the readout for a drag from `start` to `doc` with the given tool ("z −1234.5 m" for a regional handle,
 * "Δz +12 m" for a whole regional, "x 1200 m" for a pin), or null when nothing of that tool moved.
 * `screenScale` is screen px per image px, so the decimals match what one screen pixel resolves.
 */
export function dragReadoutText(doc: ProjectDoc, start: ProjectDoc, tool: string, screenScale: number): string | null {
  if (doc === start) return null;
  const frame = sectionFrame(doc);
  const unit = doc.calibration ? doc.units : 'px';
  const dx = stepDecimals(frame.unitsPerPxX / screenScale);
  const dz = stepDecimals(frame.unitsPerPxZ / screenScale);
  const now = activeScenario(doc);
  const before = activeScenario(start);
  if (tool === 'pins') {
    if (!now.pinsPx || !before.pinsPx) return null;
    const i = [0, 1].find((k) => moved(now.pinsPx![k], before.pinsPx![k]));
    return i === undefined ? null : `pin x ${fixed(imageToSection(frame, now.pinsPx[i])[0], dx)} ${unit}`;
  }
  if (tool !== 'regional') return null;
  const changed = Object.keys(now.regionals).filter((id) => now.regionals[id] !== before.regionals[id] && before.regionals[id]?.length === now.regionals[id].length);
  if (changed.length === 0) return null;
  const after = now.regionals[changed[0]];
  const was = before.regionals[changed[0]];
  const points = after.map((p, k) => k).filter((k) => moved(after[k], was[k]));
  if (points.length === 0) return null;
  if (changed.length === 1 && points.length === 1) return `z ${fixed(imageToSection(frame, after[points[0]])[1], dz)} ${unit}`;
  // A whole regional (or all of them) moved straight up or down by the same Δz in the section.
  const shift = imageToSection(frame, after[points[0]])[1] - imageToSection(frame, was[points[0]])[1];
  return `${changed.length > 1 ? 'all regionals ' : ''}Δz ${fixed(shift, dz, true)} ${unit}`;
}
