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
  /** Runs of vertex indices [from, to] (inclusive) that are projected (eroded, interpreted); indices count
   *  along pointsPx, so for a horizon in pieces along the pieces in order. */
  projected: [number, number][];
  /**
   * Where the horizon is cut by faults, in increasing `at`: a new piece starts at vertex `at` (the piece before
   * it ends at `at - 1`), and that end and this start both lie on fault `faultId` (the two cutoffs), joined along
   * the fault's trace. Empty: one unbroken line.
   */
  joins: HorizonJoin[];
}

/** A cut of a horizon by a fault: the piece starting at vertex `at` follows the previous one along fault `faultId`. */
export interface HorizonJoin { at: number; faultId: string }

/** A fault: a polyline in image pixels that horizons in pieces are joined along (docs/method.md §Faults and horizons in pieces). */
export interface DocFault {
  /** "fault-1", "fault-2", …; joins refer to a fault by id, so renaming keeps them. */
  id: string;
  /** Unique among the faults (the section file joins by name). */
  name: string;
  colour: string;
  visible: boolean;
  locked: boolean;
  /** Vertices in image pixels, in digitising order. */
  pointsPx: ImagePx[];
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
export const SCHEMA_VERSION = 2;

export interface ProjectDoc {
  schemaVersion: typeof SCHEMA_VERSION;
  title: string;
  author: string;
  units: LengthUnit;
  scan: ScanRef | null;
  calibration: Calibration | null;
  /** In stratigraphic order, youngest (top) first. */
  horizons: DocHorizon[];
  /** Faults the horizons' pieces are joined along, in drawing order. */
  faults: DocFault[];
  scenarios: Scenario[];
  activeScenarioId: string;
  settings: ProjectSettings;
  /**
   * The digitising resolution (section units) a section file stated, kept when the app opened that file;
   * absent otherwise. docToSection takes the coarser of it and one scan pixel (digitisingResolution).
   */
  resolution?: number;
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
    faults: [],
    scenarios: [{ id: 'scenario-1', name: 'Base case', pinsPx: null, regionals: {}, excluded: [] }],
    activeScenarioId: 'scenario-1',
    settings: { showDetachment: true, showGrid: false, showFills: true },
  };
}
