"use client";

import { useMemo, useState } from "react";
import type { CapturedShapes } from "./captured-shapes";
import { DEFAULT_CHORD_TOLERANCE_MM, DrawingFileError, MAX_DRAWING_BYTES, pickShapes, readDrawing, type DrawingRead, type DrawingUnit, type ShapeRole } from "./drawing-file";
import { drawingBox, guessRoles } from "./drawing-roles";

// The state of a drawing import: the file read in the browser, its unit, the chord tolerance, which shape is
// which and where the axis is; applying hands the picked shapes in mm to the form.

export function useDrawingImport(allowed: ShapeRole[], onApply: (shapes: CapturedShapes) => void) {
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [unit, setUnit] = useState<DrawingUnit | null>(null);
  const [toleranceText, setToleranceText] = useState(String(DEFAULT_CHORD_TOLERANCE_MM));
  const [roles, setRoles] = useState<Record<string, ShapeRole>>({});
  const [origin, setOrigin] = useState<"drawing" | "mouth">("drawing");
  const [hover, setHover] = useState<string | null>(null);
  const [result, setResult] = useState<{ tone: "ok" | "error"; text: string } | null>(null);

  const tolerance = Number(toleranceText);
  const toleranceError = !(tolerance > 0) || tolerance > 1 ? "Enter a chord tolerance above 0 and at most 1 mm." : null;

  const read = useMemo((): { read: DrawingRead } | { error: string } | null => {
    if (!file || toleranceError) return null;
    try {
      return { read: readDrawing(file.name, file.text, { unit: unit ?? "mm", chordToleranceMm: tolerance }) };
    } catch (error) {
      if (error instanceof DrawingFileError) return { error: error.message };
      return { error: `The drawing cannot be read: ${(error as Error).message}` };
    }
  }, [file, unit, tolerance, toleranceError]);
  const view = read && "read" in read ? read.read : null;
  const box = useMemo(() => (view ? drawingBox(view) : null), [view]);

  async function choose(f: File | undefined) {
    setFileError(null);
    setResult(null);
    setFile(null);
    if (!f) return;
    if (f.size > MAX_DRAWING_BYTES) {
      setFileError(`The file is ${(f.size / 1024 / 1024).toFixed(1)} MB; drawings are limited to ${MAX_DRAWING_BYTES / 1024 / 1024} MB. Export only the deck. Nothing was read.`);
      return;
    }
    const text = await f.text();
    try {
      const first = readDrawing(f.name, text, { unit: "mm", chordToleranceMm: DEFAULT_CHORD_TOLERANCE_MM });
      setUnit(first.declaredUnit ?? "mm");
      setRoles(guessRoles(first, allowed));
    } catch {
      // Only the first guess of the unit and the roles is lost: the same file is read again for the view just
      // below, and that reading's message (what was found, why it cannot be used) is what the picker shows.
      setUnit("mm");
      setRoles({});
    }
    setFile({ name: f.name, text });
  }

  function apply() {
    if (!view) return;
    const { shapes, problems } = pickShapes(view, roles, { unit: unit ?? "mm", origin });
    if (problems.length) {
      setResult({ tone: "error", text: `${problems.join(" ")} Nothing was put into the form.` });
      return;
    }
    onApply(shapes);
    const parts = [shapes.deck ? "the deck" : null, shapes.mouth ? "the mouth" : null, shapes.studs ? `${shapes.studs.length} studs` : null, shapes.pockets ? `${shapes.pockets.length} passages` : null, shapes.ports ? `${shapes.ports.length} ports` : null].filter(Boolean);
    setResult({ tone: "ok", text: `Put into the form: ${parts.join(", ")}.` });
  }

  const readError = read && "error" in read ? read.error : null;
  return { fileError, unit, setUnit, toleranceText, setToleranceText, toleranceError, roles, setRoles, origin, setOrigin, hover, setHover, result, readError, view, box, choose, apply };
}

export type DrawingImportState = ReturnType<typeof useDrawingImport>;
