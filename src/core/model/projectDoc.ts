// The project document: plain JSON, saved and undoable. Everything digitised is stored in image
// pixels and converted to section units through the calibration, so recalibrating updates every result.
import type { LengthUnit, XZ } from './section';

/** A point [u, v] in scan image pixels (u to the right, v down). */
export type ImagePx = [number, number];

/** A calibration point: image pixel position and its known section coordinate(s). */
export interface AxisPoint { u: number; v: number; value: number }
export interface ControlPoint { u: number; v: number; x: number; z: number }

export type Calibration =
  /** Separate horizontal and vertical scales: >= 2 points of known x, >= 2 of known z. */
  | { kind: 'axes'; xPoints: AxisPoint[]; zPoints: AxisPoint[] }
  /** >= 3 control points of known (x, z), fitted by least-squares affine. */
  | { kind: 'affine'; points: ControlPoint[] };

export interface ScanRef {
  /** Key of the scan's bytes in the image store (not part of the undo history). */
  id: string;
  name: string;
  widthPx: number;
  heightPx: number;
  /** MIME type of the stored bytes. */
  type: string;
  /** Page chosen in a multi-page file, 0-based. */
  page?: number;
}

export interface DocHorizon {
  id: string;
  name: string;
  colour: string;
  visible: boolean;
  locked: boolean;
  /** Vertices in image pixels, in digitising order. */
  pointsPx: ImagePx[];
  /** Runs of vertex indices [from, to] (inclusive) that are projected (eroded, interpreted). */
  projected: [number, number][];
}

export interface Scenario {
  id: string;
  name: string;
  /** Left and right pins as image-pixel points; each pin is the vertical section line through its point. */
  pinsPx: [ImagePx, ImagePx] | null;
  /** One regional per horizon id, in image pixels (>= 2 points). */
  regionals: Record<string, ImagePx[]>;
  /** Horizon ids left out of the area–depth fit. */
  excluded: string[];
  /** Reference elevation for depths, section units; default the highest regional elevation. */
  referenceElevation?: number;
}

export interface ProjectSettings {
  showDetachment: boolean;
  showGrid: boolean;
  showFills: boolean;
}

/**
 * The version of the document this build writes, in the document (`schemaVersion`) and in the project
 * file (`version`): one number. To add a version, see src/core/model/migrations/README.md.
 */
export const SCHEMA_VERSION = 1;

export interface ProjectDoc {
  schemaVersion: typeof SCHEMA_VERSION;
  title: string;
  author: string;
  units: LengthUnit;
  scan: ScanRef | null;
  calibration: Calibration | null;
  /** In stratigraphic order, youngest (top) first. */
  horizons: DocHorizon[];
  scenarios: Scenario[];
  activeScenarioId: string;
  settings: ProjectSettings;
}

export type { XZ };

/** Returns a new empty project document with one scenario. */
export function emptyProjectDoc(): ProjectDoc {
  return {
    schemaVersion: SCHEMA_VERSION,
    title: 'Untitled section',
    author: '',
    units: 'm',
    scan: null,
    calibration: null,
    horizons: [],
    scenarios: [{ id: 'scenario-1', name: 'Base case', pinsPx: null, regionals: {}, excluded: [] }],
    activeScenarioId: 'scenario-1',
    settings: { showDetachment: true, showGrid: false, showFills: true },
  };
}
