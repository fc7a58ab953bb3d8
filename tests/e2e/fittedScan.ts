// Where a scan of w × h pixels lands on screen once the app fits it (state/camera.ts fitCamera, margin 24),
// so tests can click scan pixels with real mouse events.
import type { Page } from '@playwright/test';

export interface Cam { box: { x: number; y: number; width: number; height: number }; scale: number; x: number; y: number }

/** Returns the camera the app fits a w × h scan with, in the section view's box. */
export async function fittedScan(page: Page, w: number, h: number): Promise<Cam> {
  const box = (await page.getByTestId('section-view').boundingBox())!;
  const scale = Math.min((box.width - 48) / w, (box.height - 48) / h);
  return { box, scale, x: (box.width - w * scale) / 2, y: (box.height - h * scale) / 2 };
}

/** Returns the page position of scan pixel (u, v). */
export const screen = (cam: Cam, u: number, v: number) => ({ x: cam.box.x + cam.x + u * cam.scale, y: cam.box.y + cam.y + v * cam.scale });

/** Clicks scan pixel (u, v). */
export async function clickAt(page: Page, cam: Cam, u: number, v: number): Promise<void> {
  const p = screen(cam, u, v);
  await page.mouse.click(p.x, p.y);
}
