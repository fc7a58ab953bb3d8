// Generated test images: each pixel's colour encodes its position, so a test can tell which image
// pixel is under a screen point (R = u scaled to 0..255, G = v scaled, B constant).
import { PNG } from 'pngjs';

/** Returns a PNG whose red channel rises left to right and green channel top to bottom. */
export function gradientPng(width: number, height: number): Buffer {
  const png = new PNG({ width, height });
  for (let v = 0; v < height; v++) {
    for (let u = 0; u < width; u++) {
      const i = (v * width + u) * 4;
      png.data[i] = Math.round((u / (width - 1)) * 255);
      png.data[i + 1] = Math.round((v / (height - 1)) * 255);
      png.data[i + 2] = 90;
      png.data[i + 3] = 255;
    }
  }
  return PNG.sync.write(png);
}
