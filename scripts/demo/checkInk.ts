// Self-check of the demo: the horizons of section.json, mapped through the calibration, fall on drawn ink.
import { PNG } from 'pngjs';
import type { LineSection as Section } from '../../src/core/model/section';
import { apply, type Affine } from './layout';

/** Returns the share of sample points (every `step` m along each horizon) that have dark ink within 1.5 px. */
export function inkShare(png: Buffer, section: Section, toImage: Affine, step = 40): number {
  const img = PNG.sync.read(png);
  const lum = (u: number, v: number): number => {
    const i = (img.width * v + u) * 4;
    return 0.3 * img.data[i] + 0.59 * img.data[i + 1] + 0.11 * img.data[i + 2];
  };
  let hits = 0;
  let total = 0;
  for (const h of section.horizons) {
    for (let i = 0; i + 1 < h.line.length; i++) {
      const [x0, z0] = h.line[i];
      const [x1, z1] = h.line[i + 1];
      const n = Math.max(1, Math.ceil(Math.hypot(x1 - x0, z1 - z0) / step));
      for (let k = 0; k < n; k++) {
        const t = k / n;
        const [u, v] = apply(toImage, [x0 + t * (x1 - x0), z0 + t * (z1 - z0)]);
        let darkest = 255;
        // Pixel (i, j) covers [i, i+1) × [j, j+1): look at the pixels around the continuous point.
        for (let du = -1.5; du <= 1.5; du += 0.5) {
          for (let dv = -1.5; dv <= 1.5; dv += 0.5) darkest = Math.min(darkest, lum(Math.floor(u + du), Math.floor(v + dv)));
        }
        total++;
        if (darkest < 90) hits++;
      }
    }
  }
  return hits / total;
}
