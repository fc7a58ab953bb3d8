// A stand-in for the scan's line tracer: the "drawn line" is v = 100 + u / 10; snapping projects onto it
// within the radius; a stretch is computed off-line (null on the first ask) and, once `finishAll()` runs,
// is the line sampled every 10 px from one anchor to the other, as the real tracer returns it.
import type { ImagePx } from '../../src/core/model/projectDoc';
import type { LineTracer } from '../../src/tools/toolTypes';

export const onLine = (u: number): number => 100 + u / 10;

export class FakeTracer implements LineTracer {
  asked = new Set<string>();
  ready = new Map<string, ImagePx[]>();

  snap(p: ImagePx, radiusPx: number): ImagePx | null {
    // Foot of the perpendicular on the line v = 100 + u/10 (direction (10, 1)).
    const t = (p[0] * 10 + (p[1] - 100)) / 101;
    const q: ImagePx = [t * 10, 100 + t];
    return Math.hypot(q[0] - p[0], q[1] - p[1]) <= radiusPx ? q : null;
  }

  stretch(from: ImagePx, to: ImagePx): ImagePx[] | null {
    const key = `${from}|${to}`;
    const got = this.ready.get(key);
    if (got) return got;
    this.asked.add(key);
    return null;
  }

  /** Completes every stretch asked so far. */
  finishAll(): void {
    for (const key of this.asked) {
      const [a, b] = key.split('|').map((s) => s.split(',').map(Number) as ImagePx);
      const pts: ImagePx[] = [a];
      const n = Math.max(1, Math.floor(Math.abs(b[0] - a[0]) / 10));
      for (let k = 1; k < n; k++) {
        const u = a[0] + ((b[0] - a[0]) * k) / n;
        pts.push([u, onLine(u)]);
      }
      pts.push(b);
      this.ready.set(key, pts);
    }
    this.asked.clear();
  }
}
