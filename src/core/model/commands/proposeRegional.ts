import { imageToSection, sectionToImage } from '../../calibration/mapPoints';
import { activeScenario } from '../docToSection';
import type { ProjectDoc } from '../projectDoc';
import { pinXs } from './pinXs';
import { sectionFrame } from './sectionFrame';
import { setRegional } from './setRegional';
import { theilSenLine } from '../../stats/theilSenLine';

/** Share of the pin width on each side of a pin whose vertices give the horizon's level there (our choice). */
export const PROPOSE_WINDOW = 0.15;

/**
 * Returns the document with a straight regional proposed for the horizon: at each pin, the level of a Theil–Sen
 * line through the horizon's vertices within ±15% of the pin width of that pin (beds are back at regional near
 * the pins, docs/method.md §Pins, regional and excess area; the robust line is unbiased under symmetric click
 * jitter, where the lowest vertex is always low), the regional through both levels, extended 5% beyond each
 * pin so it crosses both; unchanged without pins or without vertices near both pins.
 */
export function proposeRegional(doc: ProjectDoc, horizonId: string, scenarioId?: string): ProjectDoc {
  const h = doc.horizons.find((k) => k.id === horizonId);
  const frame = sectionFrame(doc);
  const pins = pinXs(activeScenario(doc, scenarioId).pinsPx, frame);
  if (!h || !pins) return doc;
  const w0 = pins[1] - pins[0];
  const pts = h.pointsPx.map((p) => imageToSection(frame, p));
  const levels = pins.map((x): [number, number] | null => {
    const xs: number[] = [], zs: number[] = [];
    for (const q of pts) if (Math.abs(q[0] - x) <= PROPOSE_WINDOW * w0) { xs.push(q[0]); zs.push(q[1]); }
    const line = theilSenLine(xs, zs);
    return line ? [x, line.intercept + line.slope * x] : null;
  });
  const [a, b] = levels;
  if (!a || !b) return doc;
  const slope = (b[1] - a[1]) / (b[0] - a[0]);
  const x0 = pins[0] - 0.05 * w0;
  const x1 = pins[1] + 0.05 * w0;
  const ends: [number, number][] = [[x0, a[1] + slope * (x0 - a[0])], [x1, a[1] + slope * (x1 - a[0])]];
  return setRegional(doc, horizonId, ends.map((q) => sectionToImage(frame, q)), scenarioId);
}
