// Re-encode the canvas PNG without its (opaque) alpha channel and with colour steps of `step`,
// which keeps the scan grain but roughly halves the file (an RGBA canvas export is ~5 MB here).
import { PNG } from 'pngjs';

/** Returns an RGB PNG of the same picture, each channel rounded to a multiple of `step` (invisible for step <= 3). */
export function compactPng(rgbaPng: Buffer, step: number): Buffer {
  const src = PNG.sync.read(rgbaPng);
  const data = Buffer.alloc(src.data.length);
  for (let i = 0; i < src.data.length; i++) data[i] = i % 4 === 3 ? 255 : Math.min(255, Math.round(src.data[i] / step) * step);
  const out = new PNG({ width: src.width, height: src.height });
  out.data = data;
  return PNG.sync.write(out, { colorType: 2, inputColorType: 6, deflateLevel: 9 });
}
