"use client";

import type { RefObject } from "react";
import type { Outline } from "@/geometry/schema";
import { lengthLabel, type LengthUnits, type NumberParse } from "@/model/units";
import { FormNotice } from "../field";
import type { CapturedShapes } from "./captured-shapes";
import { MAX_PHOTO_MB } from "./photo-file";
import type { TraceWords } from "./trace-shapes";
import type { PhotoNotice } from "./use-trace-photo";
import type { LengthEntry, TraceReference } from "./use-trace-reference";
import { passageIndex, type TracePoints } from "./use-trace-points";

// The parts of the photo trace panel around the photo: choosing the photo, its reference, what clicks go
// to, and the traced shapes read back in the form's units.

export function PhotoPicker({ fileRef, busy, decoding, notice, onChoose }: { fileRef: RefObject<HTMLInputElement | null>; busy: boolean; decoding: boolean; notice: PhotoNotice | null; onChoose: (f: File | undefined) => void }) {
  return (
    <div>
      <label htmlFor="trace-photo-file" className="field-label">
        Photo of the deck (JPEG, PNG or WebP, up to {MAX_PHOTO_MB} MB)
      </label>
      <input id="trace-photo-file" ref={fileRef} type="file" accept="image/jpeg,image/png,image/webp" className="mt-1 text-sm" disabled={busy} aria-describedby={notice ? "trace-photo-notice" : undefined} onChange={(e) => onChoose(e.target.files?.[0])} />
      {decoding ? <p className="field-hint" role="status">Reading the photo…</p> : busy ? <p className="field-hint" role="status">Keeping the photo with the case profile…</p> : null}
      {notice ? (
        <div id="trace-photo-notice" className="mt-2">
          <FormNotice tone={notice.tone}>{notice.text}</FormNotice>
        </div>
      ) : null}
    </div>
  );
}

export function ReferenceFields({ refer, units, onMode }: { refer: TraceReference; units: LengthUnits; onMode: () => void }) {
  const { mode, lengths, reference } = refer;
  const pick = (m: typeof mode) => {
    refer.setMode(m);
    onMode();
  };
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="field-label">1. Scale and perspective</legend>
      <div className="flex flex-wrap gap-4 text-sm" role="radiogroup" aria-label="How the scale is set">
        <label className="flex items-center gap-1">
          <input type="radio" name="trace-mode" checked={mode === "rectangle"} onChange={() => pick("rectangle")} /> Four studs of a measured pattern (squares up the photo)
        </label>
        <label className="flex items-center gap-1">
          <input type="radio" name="trace-mode" checked={mode === "two-point"} onChange={() => pick("two-point")} /> Two points and their distance (photo taken square on)
        </label>
      </div>
      <div className="flex flex-wrap items-start gap-4">
        {mode === "rectangle" ? (
          <>
            <LengthInput id="trace-across" label="Stud spacing across (x)" units={units} entry={lengths.across} />
            <LengthInput id="trace-along" label="Stud spacing along (y)" units={units} entry={lengths.along} />
            <label className="flex items-center gap-1 self-end pb-2 text-sm">
              <input type="checkbox" checked={refer.studsFromRef} onChange={(e) => refer.setStudsFromRef(e.target.checked)} /> the four points are the case&apos;s studs
            </label>
          </>
        ) : (
          <LengthInput id="trace-distance" label="Measured distance between the two points" units={units} entry={lengths.distance} hint="The origin goes midway between them: two studs across the diagonal put it on the cylinder axis." />
        )}
      </div>
      {reference && "error" in reference ? (
        <p className="field-error" role="alert">{reference.error}</p>
      ) : reference ? (
        <div className={reference.fits ? "text-sm text-success" : "caution"} role="status" data-testid="trace-fit">
          {reference.summary}
        </div>
      ) : null}
      {mode === "rectangle" ? <p className="field-hint">The origin is the centre of the four studs, x across and y along the pattern as they appear in the photo.</p> : null}
    </fieldset>
  );
}

export function TargetButtons({ points, words, disabled }: { points: TracePoints; words: TraceWords; disabled: boolean }) {
  const on = (t: string) => points.step === "trace" && points.target === t;
  return (
    <fieldset className="flex flex-col gap-2" disabled={disabled}>
      <legend className="field-label">2. Trace</legend>
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <button type="button" className={points.step === "reference" ? "btn" : "btn-quiet"} onClick={() => points.aim("reference")} aria-pressed={points.step === "reference"}>
          Reference points
        </button>
        {(["studs", "deck", "mouth"] as const).map((t) => (
          <button key={t} type="button" className={on(t) ? "btn" : "btn-quiet"} aria-pressed={on(t)} onClick={() => points.aim("trace", t)}>
            {t === "studs" ? "Studs" : t === "deck" ? words.deck : words.mouth}
          </button>
        ))}
        {points.points.passages.map((_, i) => (
          <button key={i} type="button" className={on(`passage-${i}`) ? "btn" : "btn-quiet"} aria-pressed={on(`passage-${i}`)} onClick={() => points.aim("trace", `passage-${i}`)}>
            {words.passage} {i + 1}
          </button>
        ))}
        <button type="button" className="btn-quiet" onClick={points.addPassage}>
          Add a {words.passage.toLowerCase()}
        </button>
        <label className="flex items-center gap-1">
          <input type="checkbox" checked={points.points.mouthRound} onChange={(e) => points.setMouthRound(e.target.checked)} /> round {words.mouth.toLowerCase()}
        </label>
      </div>
    </fieldset>
  );
}

/** What clicks do now, in words. */
export function promptFor(points: TracePoints, refer: TraceReference, words: TraceWords): string {
  if (points.step === "reference")
    return refer.mode === "rectangle" ? `Click the centres of the four studs (${refer.refPx.length} of 4).` : `Click the two points whose distance you measured (${refer.refPx.length} of 2).`;
  const t = points.target;
  const what = t === "studs" ? "Studs" : t === "deck" ? `${words.deck} corners` : t === "mouth" ? (points.points.mouthRound ? `${words.mouth} (three points on its edge)` : `${words.mouth} corners`) : `${words.passage} ${passageIndex(t) + 1} corners`;
  return `Click to add: ${what}.`;
}

function LengthInput({ id, label, units, entry, hint }: { id: string; label: string; units: LengthUnits; entry: LengthEntry; hint?: string }) {
  const parse: NumberParse = entry.parse;
  const error = !parse.ok ? parse.message : parse.value !== undefined && parse.value <= 0 ? "must be more than zero" : undefined;
  return (
    <div className="w-56">
      <label htmlFor={id} className="field-label">
        {label} <span className="text-ink-2 num">({units})</span>
      </label>
      <input id={id} className="field-input num" inputMode="decimal" value={entry.text} onChange={(e) => entry.set(e.target.value)} aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined} />
      {error ? <p id={`${id}-error`} className="field-error" role="alert">{error}</p> : hint ? <p id={`${id}-hint`} className="field-hint">{hint}</p> : null}
    </div>
  );
}

export function TracedReadout({ shapes, units, words }: { shapes: CapturedShapes; units: LengthUnits; words: TraceWords }) {
  const pt = (p: readonly [number, number]) => `${lengthLabel(p[0], units)}, ${lengthLabel(p[1], units)}`;
  const outline = (o: Outline) => (o.kind === "circle" ? `circle Ø ${lengthLabel(o.diameterMm, units)} at ${pt(o.centerMm ?? [0, 0])}` : o.pointsMm.map(pt).join("; "));
  const rows: [string, string][] = [];
  if (shapes.studs) rows.push(["Studs", shapes.studs.map((s) => `${s.label} (${pt(s.positionMm)})`).join("; ")]);
  if (shapes.deck) rows.push([words.deck, outline(shapes.deck)]);
  if (shapes.mouth) rows.push([words.mouth, outline(shapes.mouth)]);
  for (const p of shapes.pockets ?? shapes.ports ?? []) rows.push([p.label, outline(p.outline)]);
  return (
    <div className="text-sm" data-testid="trace-readout" data-shapes={JSON.stringify(shapes)}>
      <h3 className="font-medium">Traced, in {units}</h3>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-3 gap-y-1">
        {rows.map(([term, value]) => (
          <div key={term} className="contents">
            <dt>{term}</dt>
            <dd className="num">{value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
