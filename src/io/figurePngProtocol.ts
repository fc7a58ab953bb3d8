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

/**
 * An export is two messages, so that the worker paints the figure while the page is still taking the scan region:
 * first the figure (`scanFollows`: a scan message comes next), then, when it shows a scan, the region (null: none
 * after all). The worker answers each export with steps and then done or failed, and is then free for the next.
 */
export interface FigurePngRequest {
  kind: 'figure';
  /** The figure's part below the scan and its part above, each a whole SVG document of `figure` units. */
  under: string;
  over: string;
  figure: { width: number; height: number };
  /** The panel the scan is clipped to (figure units). */
  panel: { x: number; y: number; w: number; h: number };
  width: number;
  height: number;
  scanFollows: boolean;
}

export interface FigurePngScan { kind: 'scan'; scan: FigureScanRegion | null }

/**
 * The figure's two parts sent ahead of an export (when the export menu opens): the worker parses them meanwhile and
 * keeps the trees, and an export whose parts are the same markup paints from them instead of parsing again.
 */
export interface FigurePngPrepare { kind: 'prepare'; under: string; over: string }

export type FigurePngMessage = FigurePngRequest | FigurePngScan | FigurePngPrepare;

export type FigurePngReply = { kind: 'step'; step: PngStep } | { kind: 'done'; blob: Blob } | { kind: 'failed'; message: string };
