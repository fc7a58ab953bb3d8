// Turns one decoded TIFF directory into 8-bit RGBA for display. 8-bit, palette and bilevel pages go
// through the decoder's own conversion; 16- and 32-bit samples (and floating-point rasters such as
// elevation GeoTIFFs) are scaled here from the page's own range, honouring the file's byte order.
import * as UTIF from 'utif2';

export type TiffIfd = UTIF.IFD & { isLE?: boolean };

export interface TiffPageInfo {
  index: number;
  widthPx: number;
  heightPx: number;
  bitsPerSample: number;
  samplesPerPixel: number;
  /** 'grey' | 'rgb' | 'palette' | 'cmyk' | 'other' */
  colour: string;
  /** Marked as a reduced-resolution copy of another page (a preview). */
  reduced: boolean;
  /** Carries GeoTIFF georeferencing tags. */
  geo: boolean;
}

function tag(ifd: TiffIfd, n: number): number | undefined {
  const v = ifd[`t${n}`] as number[] | undefined;
  return Array.isArray(v) ? Number(v[0]) : undefined;
}

/** Returns the page's size and sample layout from its directory (no pixel data needed). */
export function tiffPageInfo(ifd: TiffIfd, index: number): TiffPageInfo {
  const photometric = tag(ifd, 262) ?? 1;
  const colour = ({ 0: 'grey', 1: 'grey', 2: 'rgb', 3: 'palette', 5: 'cmyk' } as Record<number, string>)[photometric] ?? 'other';
  return {
    index,
    widthPx: tag(ifd, 256) ?? 0,
    heightPx: tag(ifd, 257) ?? 0,
    bitsPerSample: tag(ifd, 258) ?? 1,
    samplesPerPixel: tag(ifd, 277) ?? 1,
    colour,
    reduced: ((tag(ifd, 254) ?? 0) & 1) === 1,
    geo: ifd.t33550 !== undefined || ifd.t33922 !== undefined || ifd.t34735 !== undefined || ifd.t34264 !== undefined,
  };
}

function readSamples(ifd: TiffIfd, bits: number, format: number): Float64Array {
  const data = ifd.data;
  const dv = new DataView(data.buffer, data.byteOffset, data.byteLength);
  const le = ifd.isLE !== false;
  const n = Math.floor((data.length * 8) / bits);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const o = (i * bits) / 8;
    if (bits === 16) out[i] = format === 2 ? dv.getInt16(o, le) : dv.getUint16(o, le);
    else if (format === 3) out[i] = dv.getFloat32(o, le);
    else out[i] = format === 2 ? dv.getInt32(o, le) : dv.getUint32(o, le);
  }
  return out;
}

function wideToRgba(ifd: TiffIfd, info: TiffPageInfo): Uint8ClampedArray {
  const { widthPx: w, heightPx: h, samplesPerPixel: spp, bitsPerSample: bits } = info;
  const format = tag(ifd, 339) ?? 1;
  const s = readSamples(ifd, bits, format);
  const colourSamples = info.colour === 'rgb' ? 3 : 1;
  // Integer samples span their type's full range (common practice for 16-bit scans); floating-point
  // rasters (elevations, intensities) have no natural range, so their finite min..max is used.
  let lo = 0;
  let hi = bits === 16 ? 65535 : 4294967295;
  if (format === 2) {
    lo = bits === 16 ? -32768 : -2147483648;
    hi = -lo - 1;
  }
  if (format === 3) {
    lo = Infinity;
    hi = -Infinity;
    for (let i = 0; i < w * h * spp; i++) {
      if (i % spp >= colourSamples || !Number.isFinite(s[i])) continue;
      if (s[i] < lo) lo = s[i];
      if (s[i] > hi) hi = s[i];
    }
    if (!(hi > lo)) hi = lo + 1;
  }
  const k = 255 / (hi - lo);
  const invert = (tag(ifd, 262) ?? 1) === 0;
  const rgba = new Uint8ClampedArray(w * h * 4);
  for (let p = 0; p < w * h; p++) {
    const base = p * spp;
    for (let c = 0; c < 3; c++) {
      const v = s[base + (colourSamples === 3 ? c : 0)];
      const g = Number.isFinite(v) ? (v - lo) * k : 0;
      rgba[p * 4 + c] = invert ? 255 - g : g;
    }
    rgba[p * 4 + 3] = spp > colourSamples && format !== 3 ? (s[base + colourSamples] - lo) * k : 255;
  }
  return rgba;
}

/** Returns the decoded page as 8-bit RGBA (width × height × 4); throws on a layout it cannot show. */
export function tiffToRgba(ifd: TiffIfd, info: TiffPageInfo): Uint8ClampedArray {
  if ((info.bitsPerSample === 16 || info.bitsPerSample === 32) && (info.colour === 'grey' || info.colour === 'rgb')) return wideToRgba(ifd, info);
  const rgba = UTIF.toRGBA8(ifd);
  if (rgba.length !== info.widthPx * info.heightPx * 4) throw new Error('unsupported sample layout');
  return new Uint8ClampedArray(rgba.buffer, rgba.byteOffset, rgba.length);
}
