"use client";

import { useState } from "react";
import type { LengthUnits } from "@/model/units";
import type { CapturedShapes, PhotoReference } from "./captured-shapes";
import { appliedWords, TRACE_WORDS, tracedShapes, type ShapesFor } from "./trace-shapes";
import { TraceMarks } from "./trace-marks";
import { PhotoPicker, promptFor, ReferenceFields, TargetButtons, TracedReadout } from "./trace-panels";
import { TraceSurface } from "./trace-surface";
import { useTracePhoto, type ChosenPhoto } from "./use-trace-photo";
import { useTracePoints } from "./use-trace-points";
import { useTraceReference } from "./use-trace-reference";

// Trace a case's deck over a photo of it. First the reference: four clicked studs of the measured pattern
// (the photo is squared up by a perspective solve) or two clicked points and the distance between them.
// Then click the studs and the corners of the deck, the mouth and the passages; every point turns into mm.

export type { ChosenPhoto };

type Props = {
  onApply: (shapes: CapturedShapes) => void;
  /** The case profile the photo is kept with; without one (a case not saved yet) the photo is only traced here. */
  caseId?: string | null;
  units?: LengthUnits;
  /** A case's deck (deck, mouth, passages) or a kit's base gasket (outline, bore, port windows). */
  shapesFor?: ShapesFor;
  /** Reference points kept with the photo before: restored, so the trace goes on without clicking them again. */
  initialReference?: PhotoReference;
  /** Told each time the reference becomes usable (its points and measured lengths) or is cleared (null). */
  onReferenceChange?: (ref: PhotoReference | null) => void;
  /** Without a case to keep it with yet: told of each photo chosen, so the form can keep it at the case's first save. */
  onPhotoChosen?: (photo: ChosenPhoto) => void;
};

export function PhotoTrace({ onApply, caseId = null, units = "mm", shapesFor = "case", initialReference, onReferenceChange, onPhotoChosen }: Props) {
  const words = TRACE_WORDS[shapesFor];
  const [applied, setApplied] = useState<string | null>(null);
  const points = useTracePoints();
  const startOver = () => {
    refer.setRefPx([]);
    points.clear();
    setApplied(null);
  };
  const shown = useTracePhoto({ caseId, onNewPhoto: startOver, onPhotoChosen });
  const { photo } = shown;
  const refer = useTraceReference({ photo, units, initialReference, onReferenceChange, onRestored: () => points.aim("trace") });
  const { map, mode, refPx, need, studsFromRef } = refer;
  // A few dozen points: computed on each render.
  const traced = map ? tracedShapes(map, points.points, mode === "rectangle" && studsFromRef ? refPx : [], shapesFor) : null;
  const nothingTraced = !traced || Object.keys(traced.shapes).length === 0;
  const ready = photo !== null && !shown.decoding;
  const placed = points.placedFor(refPx);

  const place = (p: readonly [number, number]) => {
    setApplied(null);
    if (points.step === "reference") refer.setRefPx((r) => (r.length >= need ? r : [...r, p]));
    else points.place(p);
  };
  const removeLast = () => {
    setApplied(null);
    if (points.step === "reference") refer.setRefPx((r) => r.slice(0, -1));
    else points.removeLast();
  };
  const apply = () => {
    if (!traced || traced.problems.length || nothingTraced) return;
    onApply(traced.shapes);
    setApplied(appliedWords(traced.shapes, words));
  };

  return (
    <section className="card flex flex-col gap-4 p-4" aria-label="Trace from a photo">
      <div>
        <h2 className="text-lg font-semibold">Trace from a photo</h2>
        <p className="text-sm text-ink-2">
          Photograph the deck from above, roughly square on, with the whole stud pattern in view. Measure the stud spacing with calipers; the photo is
          squared up from the four studs, then click the outlines. Check every traced figure against the part before cutting.
        </p>
      </div>
      <PhotoPicker fileRef={shown.fileRef} busy={shown.busy} decoding={shown.decoding} notice={shown.notice} onChoose={(f) => void shown.choose(f)} />
      {photo ? (
        <>
          <ReferenceFields refer={refer} units={units} onMode={() => points.aim("reference")} />
          <TargetButtons points={points} words={words} disabled={!map} />
          <p className="text-sm" aria-live="polite" data-testid="trace-prompt">{promptFor(points, refer, words)}</p>
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn-quiet" onClick={removeLast}>Remove the last point</button>
            <button type="button" className="btn-quiet" onClick={startOver}>Start over</button>
          </div>
          <TraceSurface photo={photo} ready={ready} placed={placed.length} canvasRef={shown.canvasRef} onPlace={place}>
            {(cursor) => <TraceMarks photoSizePx={Math.max(photo.widthPx, photo.heightPx)} mode={mode} refPx={refPx} points={points.points} traced={traced} cursor={cursor} />}
          </TraceSurface>
          {traced ? <TracedReadout shapes={traced.shapes} units={units} words={words} /> : null}
          {traced?.problems.length ? (
            <ul className="text-sm text-error" role="alert">
              {traced.problems.map((p) => <li key={p}>{p} Not put into the form until it is fixed.</li>)}
            </ul>
          ) : null}
          <div className="flex flex-wrap items-center gap-3">
            <button type="button" className="btn" onClick={apply} disabled={!traced || nothingTraced || traced.problems.length > 0}>
              Put the traced shapes into the form
            </button>
            {applied ? <span role="status" className="text-sm text-success">{applied}</span> : null}
          </div>
        </>
      ) : null}
    </section>
  );
}
