import { readDxf } from "./drawing-dxf";
import { readSvg } from "./drawing-svg";
import { DEFAULT_CHORD_TOLERANCE_MM, DrawingFileError, MAX_DRAWING_BYTES, MM_PER_UNIT, type DrawingRead, type ReadOptions } from "./drawing-types";

// Reads a deck drawing (DXF or SVG) into closed shapes a person can pick from: the deck, the mouth, the
// passages, the stud holes. Curves become polygons whose vertices lie on the curve and whose chords stray
// from it by no more than the chord tolerance (arcs and bulges exactly so; splines by subdividing until
// the curve's quarter, half and three-quarter points are within it). Whole circles stay circles.

export * from "./drawing-types";
export { centreOf, pickShapes, type PickOptions, type PickResult, type ShapeRole } from "./drawing-pick";

/** Reads a DXF or SVG by its text (the name only helps tell which). */
export function readDrawing(fileName: string, text: string, options: ReadOptions): DrawingRead {
  const bytes = new TextEncoder().encode(text).length;
  if (bytes > MAX_DRAWING_BYTES) {
    throw new DrawingFileError("too-large", `The file is ${(bytes / 1024 / 1024).toFixed(1)} MB; drawings are limited to ${MAX_DRAWING_BYTES / 1024 / 1024} MB. Export only the deck.`);
  }
  if (text.trim() === "") throw new DrawingFileError("empty", "The file is empty.");
  const toleranceMm = options.chordToleranceMm ?? DEFAULT_CHORD_TOLERANCE_MM;
  if (!(toleranceMm > 0) || toleranceMm > 1) throw new DrawingFileError("malformed", "The chord tolerance must be more than 0 and at most 1 mm.");
  const tolerance = toleranceMm / MM_PER_UNIT[options.unit];
  const looksSvg = /\.svg$/i.test(fileName) || /^\s*(<\?xml[^>]*>\s*)?(<!--[\s\S]*?-->\s*)*(<!DOCTYPE[^>]*>\s*)?<svg[\s>]/i.test(text);
  const looksDxf = /\.dxf$/i.test(fileName) || /^\s*0\s*\r?\n\s*SECTION\s*\r?\n/.test(text);
  if (looksSvg) return readSvg(text, tolerance);
  if (looksDxf) return readDxf(text, tolerance);
  throw new DrawingFileError("unknown-format", "This is neither a DXF nor an SVG drawing (judged by its name and first line).");
}
