import { MM_PER_INCH } from "@/geometry/units";

// The words of a drawing read for its deck shapes: its units, its limits, what is found, what goes wrong.

export type DrawingUnit = "mm" | "in";
export const MM_PER_UNIT: Record<DrawingUnit, number> = { mm: 1, in: MM_PER_INCH };

/** Files above this are refused before they are read. */
export const MAX_DRAWING_BYTES = 5 * 1024 * 1024;
/** Drawings with more entities or elements than this are refused before they are parsed. */
export const MAX_DRAWING_ENTITIES = 10_000;
export const DEFAULT_CHORD_TOLERANCE_MM = 0.02;
export const MAX_OUTLINE_POINTS = 2000;

export type DrawingProblem = "empty" | "too-large" | "too-many-entities" | "malformed" | "no-closed-outline" | "unknown-format";

/** A drawing that cannot give a single closed shape, said in words with what was found. */
export class DrawingFileError extends Error {
  constructor(
    readonly problem: DrawingProblem,
    message: string,
  ) {
    super(message);
    this.name = "DrawingFileError";
  }
}

/** A point in the drawing's own units. */
export type P = [number, number];

/** One closed shape of the drawing, in the drawing's own units and axes (y up). */
export type DrawingShape = {
  id: string;
  /** What it was in the file, in words: "closed polyline on layer DECK (8 corners, 4 arcs)". */
  source: string;
  layer: string | null;
  shape: { kind: "circle"; center: P; radius: number } | { kind: "polygon"; points: P[] };
};

export type DrawingRead = {
  format: "dxf" | "svg";
  shapes: DrawingShape[];
  /** What was in the file but is not a closed shape, counted: "3 TEXT", "2 open LINE". */
  notUsed: string[];
  /** The unit the file declares, when it declares one. */
  declaredUnit: DrawingUnit | null;
};

export type ReadOptions = { unit: DrawingUnit; chordToleranceMm?: number };
