// The messages between the page and the figure's PNG worker (io/workers/figurePng.worker.ts).

/** The steps of a PNG export, for its progress message. */
export type PngStep = 'scan-region' | 'figure' | 'scan' | 'labels' | 'encoding';

/** The scan region the figure shows, in pieces of one pyramid level, and where it goes. */
export interface FigureScanRegion {
  /** Region size in its level's pixels. */
  regionW: number;
  regionH: number;
  /** Pieces of the region: bitmaps placed at (x, y) region pixels (transferred; the worker closes them). */
  tiles: { bitmap: ImageBitmap; x: number; y: number }[];
  /** The region's top-left corner in scan pixels. */
  originPx: [number, number];
  /** Scan pixels per region pixel, across and down. */
  pxPerRegionPx: [number, number];
  /** Scan pixels → figure units (SVG order a b c d e f). */
  matrix: [number, number, number, number, number, number];
  opacity: number;
}

export interface FigurePngRequest {
  /** The figure's part below the scan and its part above, each a whole SVG document of `figure` units. */
  under: string;
  over: string;
  figure: { width: number; height: number };
  /** The panel the scan is clipped to (figure units). */
  panel: { x: number; y: number; w: number; h: number };
  width: number;
  height: number;
  scan: FigureScanRegion | null;
}

export type FigurePngReply = { kind: 'step'; step: PngStep } | { kind: 'done'; blob: Blob } | { kind: 'failed'; message: string };
