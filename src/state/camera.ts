// Camera arithmetic for the section view: screen = image * scale + offset.
import type { Camera, FitTarget } from './sessionStore';

export const MIN_SCALE = 1 / 256;
export const MAX_SCALE = 64;

/** Returns the camera zoomed by `factor` about the screen point (sx, sy), clamped to the scale range. */
export function zoomAbout(camera: Camera, sx: number, sy: number, factor: number): Camera {
  const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, camera.scale * factor));
  const k = scale / camera.scale;
  return { scale, x: sx - (sx - camera.x) * k, y: sy - (sy - camera.y) * k };
}

/** Returns the camera that fits an image of the given size inside the viewport with a margin. */
export function fitCamera(imageW: number, imageH: number, viewW: number, viewH: number, margin = 24): Camera {
  if (imageW <= 0 || imageH <= 0 || viewW <= 0 || viewH <= 0) return { scale: 1, x: 0, y: 0 };
  const scale = Math.min((viewW - 2 * margin) / imageW, (viewH - 2 * margin) / imageH);
  const s = Math.max(MIN_SCALE, scale);
  return { scale: s, x: (viewW - imageW * s) / 2, y: (viewH - imageH * s) / 2 };
}

/** Returns the camera that fits the target's image-pixel box inside the viewport with its margin (fitCamera, moved to the box). */
export function fitTargetCamera(target: FitTarget, viewW: number, viewH: number): Camera {
  const c = fitCamera(target.width, target.height, viewW, viewH, target.margin);
  return { scale: c.scale, x: c.x - target.u0 * c.scale, y: c.y - target.v0 * c.scale };
}

/**
 * Returns the camera once the view has changed size from `from` to `to` (screen px): fitted again to `fitted` when
 * the user has not zoomed or panned since the last fit, otherwise at the same scale with the image point that was at
 * the view's centre at the new centre.
 */
export function resizedCamera(camera: Camera, fitted: FitTarget | null, from: { width: number; height: number }, to: { width: number; height: number }): Camera {
  if (fitted) return fitTargetCamera(fitted, to.width, to.height);
  return { scale: camera.scale, x: camera.x + (to.width - from.width) / 2, y: camera.y + (to.height - from.height) / 2 };
}

/** Returns the image-pixel position under a screen point. */
export function screenToImage(camera: Camera, sx: number, sy: number): [number, number] {
  return [(sx - camera.x) / camera.scale, (sy - camera.y) / camera.scale];
}
