import type { Page } from '@playwright/test';

/** Returns the RGBA of the composited section view at a point relative to the view's box. */
export async function viewPixel(page: Page, x: number, y: number): Promise<[number, number, number, number]> {
  return page.evaluate(
    ([px, py]) => {
      const box = document.querySelector('[data-testid="section-view"]') as HTMLElement;
      const canvases = Array.from(box.querySelectorAll('canvas'));
      const ratio = window.devicePixelRatio || 1;
      let out: [number, number, number, number] = [0, 0, 0, 0];
      for (const c of canvases) {
        const d = c.getContext('2d')!.getImageData(Math.round(px * ratio), Math.round(py * ratio), 1, 1).data;
        if (d[3] > 0) out = [d[0], d[1], d[2], d[3]];
      }
      return out;
    },
    [x, y] as const,
  );
}
