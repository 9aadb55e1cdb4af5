"use client";

import { useEffect, useMemo, useRef, useState } from "react";
import { rectangleFit, ReferencePointsError, twoPointScale, type PhotoToMm, type Point } from "@/geometry/homography";
import { lengthFieldText, lengthLabel, parseLengthText, type LengthUnits, type NumberParse } from "@/model/units";
import type { PhotoReference } from "./captured-shapes";
import type { TracePhoto } from "./use-trace-photo";

// The reference of a photo: four clicked studs of a measured pattern (the photo is squared up by a
// perspective solve) or two clicked points and the distance between them. Restored from what was kept
// with the photo, and reported to the keeper whenever it changes.

export type Mode = "rectangle" | "two-point";

export type Reference = { map: PhotoToMm; summary: string; fits: boolean } | { error: string } | null;

/** A length field of the reference: what is typed and what it reads as. */
export type LengthEntry = { text: string; set: (t: string) => void; parse: NumberParse };

type Options = {
  photo: TracePhoto | null;
  units: LengthUnits;
  initialReference?: PhotoReference;
  onReferenceChange?: (ref: PhotoReference | null) => void;
  /** A kept reference was put back: tracing can go on. */
  onRestored: () => void;
};

const POINTS_NEEDED: Record<Mode, number> = { rectangle: 4, "two-point": 2 };

/** The lengths measured on the part that the clicked points stand for, in mm (undefined: not given yet). */
type Measured = { mode: Mode; acrossMm?: number; alongMm?: number; distanceMm?: number };

/** The photo's scale or perspective from the clicked points and the measured lengths, how well they fit, or why they cannot be used. */
function solveReference(photo: TracePhoto, refPx: Point[], m: Measured, units: LengthUnits): Reference {
  if (refPx.length < POINTS_NEEDED[m.mode]) return null;
  try {
    if (m.mode === "rectangle") {
      if (m.acrossMm === undefined || m.alongMm === undefined) return null;
      const fit = rectangleFit(refPx, m.acrossMm, m.alongMm, { width: photo.widthPx, height: photo.heightPx }, (mm) => lengthLabel(mm, units));
      return { map: fit.map, summary: fit.summary, fits: fit.fits };
    }
    if (m.distanceMm === undefined) return null;
    return { map: twoPointScale(refPx[0], refPx[1], m.distanceMm), summary: `Scale set: ${lengthLabel(m.distanceMm, units)} between the two points.`, fits: true };
  } catch (error) {
    if (error instanceof ReferencePointsError) return { error: error.message };
    throw error;
  }
}

/** What is kept with the photo for a reference that solved: the clicked points and the measured lengths. */
function referenceToKeep(refPx: Point[], m: Measured): PhotoReference | null {
  const pts = refPx.map((p): [number, number] => [p[0], p[1]]);
  if (m.mode === "rectangle" && pts.length === 4 && m.acrossMm !== undefined && m.alongMm !== undefined) return { kind: "rectangle", points: [pts[0], pts[1], pts[2], pts[3]], widthMm: m.acrossMm, heightMm: m.alongMm };
  if (m.mode === "two-point" && pts.length === 2 && m.distanceMm !== undefined) return { kind: "scale", points: [pts[0], pts[1]], distanceMm: m.distanceMm };
  return null;
}

/** Tells the keeper of the photo each new reference, but not the one it just handed back. */
function useReportReference(current: PhotoReference | null, photo: TracePhoto | null, restoredKey: string, onReferenceChange?: (ref: PhotoReference | null) => void) {
  const reported = useRef(restoredKey);
  const restoredSeen = useRef(restoredKey);
  useEffect(() => {
    const key = JSON.stringify(current);
    // What was just restored came from the keeper: no news to it.
    if (restoredSeen.current !== restoredKey) reported.current = restoredSeen.current = restoredKey;
    if (key === reported.current) return;
    // A photo still being shown has not lost its reference yet: nothing to report until it is on screen.
    if (!current && !photo) return;
    reported.current = key;
    onReferenceChange?.(current);
  }, [current, photo, onReferenceChange, restoredKey]);
}

export function useTraceReference({ photo, units, initialReference, onReferenceChange, onRestored }: Options) {
  const [mode, setModeState] = useState<Mode>("rectangle");
  const [refPx, setRefPx] = useState<Point[]>([]);
  const [acrossText, setAcrossText] = useState("");
  const [alongText, setAlongText] = useState("");
  const [distanceText, setDistanceText] = useState("");
  const [studsFromRef, setStudsFromRef] = useState(true);
  // A kept length stays exact while its field still shows it as restored (inch text rounds to 0.001 in).
  const [kept, setKept] = useState<{ across?: number; along?: number; distance?: number }>({});

  const across = parseLengthText(acrossText, units);
  const along = parseLengthText(alongText, units);
  const distance = parseLengthText(distanceText, units);
  const exact = (text: string, parsed: NumberParse, keptMm: number | undefined) => (keptMm !== undefined && text === lengthFieldText(keptMm, units) ? keptMm : parsed.ok ? parsed.value : undefined);
  const acrossMm = exact(acrossText, across, kept.across);
  const alongMm = exact(alongText, along, kept.along);
  const distanceMm = exact(distanceText, distance, kept.distance);
  const need = POINTS_NEEDED[mode];

  const reference = useMemo(() => (photo ? solveReference(photo, refPx, { mode, acrossMm, alongMm, distanceMm }, units) : null), [photo, refPx, mode, acrossMm, alongMm, distanceMm, units]);
  const map = reference && "map" in reference ? reference.map : null;

  // Restored from what was kept (whenever that changes), in the render that sees it.
  const restoredKey = JSON.stringify(initialReference ?? null);
  const [restored, setRestored] = useState("null");
  if (restored !== restoredKey) {
    setRestored(restoredKey);
    if (initialReference) {
      const r = initialReference;
      setKept(r.kind === "rectangle" ? { across: r.widthMm, along: r.heightMm } : { distance: r.distanceMm });
      setModeState(r.kind === "rectangle" ? "rectangle" : "two-point");
      if (r.kind === "rectangle") {
        setAcrossText(lengthFieldText(r.widthMm, units));
        setAlongText(lengthFieldText(r.heightMm, units));
      } else setDistanceText(lengthFieldText(r.distanceMm, units));
      setRefPx(r.points);
      onRestored();
    }
  }

  const current = useMemo(() => (map ? referenceToKeep(refPx, { mode, acrossMm, alongMm, distanceMm }) : null), [map, refPx, mode, acrossMm, alongMm, distanceMm]);
  useReportReference(current, photo, restoredKey, onReferenceChange);

  const setMode = (m: Mode) => {
    setModeState(m);
    setRefPx([]);
  };
  const lengths: Record<"across" | "along" | "distance", LengthEntry> = {
    across: { text: acrossText, set: setAcrossText, parse: across },
    along: { text: alongText, set: setAlongText, parse: along },
    distance: { text: distanceText, set: setDistanceText, parse: distance },
  };
  return { mode, setMode, refPx, setRefPx, need, lengths, studsFromRef, setStudsFromRef, reference, map };
}

export type TraceReference = ReturnType<typeof useTraceReference>;
