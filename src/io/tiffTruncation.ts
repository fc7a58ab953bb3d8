import type { TiffIfd } from './decodeTiffPixels';
import { countText } from '../core/model/limits';

// A TIFF page whose strips or tiles point past the end of the file has lost part of its pixels (a copy
// cut short). The decoder would fill the missing part with black; it is refused instead, with how much is
// missing. Tags from the TIFF 6.0 specification: StripOffsets 273, StripByteCounts 279, TileOffsets 324,
// TileByteCounts 325.

function numbers(v: unknown): number[] {
  return Array.isArray(v) ? v.filter((x): x is number => typeof x === 'number') : [];
}

/** Returns the message for a page whose pixel data runs past the end of the file ("is truncated: …"), or null when it is all there. */
export function tiffTruncation(ifd: TiffIfd, fileBytes: number, page: number): string | null {
  const tags = ifd as unknown as Record<string, unknown>;
  const offsets = numbers(tags.t273).length ? numbers(tags.t273) : numbers(tags.t324);
  const counts = numbers(tags.t279).length ? numbers(tags.t279) : numbers(tags.t325);
  let needed = 0, present = 0, end = 0;
  for (let i = 0; i < offsets.length && i < counts.length; i++) {
    needed += counts[i];
    present += Math.max(0, Math.min(counts[i], fileBytes - offsets[i]));
    end = Math.max(end, offsets[i] + counts[i]);
  }
  if (end <= fileBytes) return null;
  const missing = Math.max(1, Math.round((100 * (needed - present)) / Math.max(1, needed)));
  return `(page ${page + 1}) is truncated: its pixel data runs to byte ${countText(end)} but the file ends at byte ${countText(fileBytes)} (about ${missing} % of the image is missing); open a complete copy of the file`;
}
