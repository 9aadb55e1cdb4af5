"use client";

import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent } from "react";
import { OutlineSchema, type Outline } from "@/geometry/schema";
import { orderAsRectangle, pxToMm, rectangleFit, ReferencePointsError, twoPointScale, type PhotoToMm, type Point } from "@/geometry/homography";
import { lengthFieldText, lengthLabel, parseLengthText, type LengthUnits } from "@/model/units";
import { callApi } from "../api-client";
import { FormNotice } from "../field";
import type { CapturedShapes, PhotoReference } from "./captured-shapes";
import { circleThrough, photoProblem, sniffPhotoType, MAX_PHOTO_MB, type PhotoType } from "./photo-file";

// Trace a case's deck over a photo of it. First the reference: four clicked studs of the measured pattern
// (the photo is squared up by a perspective solve) or two clicked points and the distance between them.
// Then click the studs and the corners of the deck, the mouth and the passages; every point turns into mm.

/** The photo shown: its upright size in pixels (the original's) and where the browser can draw it from. */
type Photo = { src: string; widthPx: number; heightPx: number; storedId: string | null };
type Mode = "rectangle" | "two-point";
type Target = "studs" | "deck" | "mouth" | `passage-${number}`;

/** The longest side a photo is drawn at; the original is kept as it was. */
const DISPLAY_MAX_PX = 1600;

type Props = {
  onApply: (shapes: CapturedShapes) => void;
  /** The case profile the photo is kept with; without one (a case not saved yet) the photo is only traced here. */
  caseId?: string | null;
  units?: LengthUnits;
  /** A case's deck (deck, mouth, passages) or a kit's base gasket (outline, bore, port windows). */
  shapesFor?: "case" | "gasket";
  /** Reference points kept with the photo before: restored, so the trace goes on without clicking them again. */
  initialReference?: PhotoReference;
  /** Told each time the reference becomes usable (its points and measured lengths) or is cleared (null). */
  onReferenceChange?: (ref: PhotoReference | null) => void;
  /** Without a case to keep it with yet: told of each photo chosen, so the form can keep it at the case's first save. */
  onPhotoChosen?: (photo: ChosenPhoto) => void;
};

/** A photo chosen before its case profile is saved: the file as chosen, its checked type and its upright size. */
export type ChosenPhoto = { file: File; contentType: PhotoType; widthPx: number; heightPx: number };

const WORDS = {
  case: { deck: "Deck", mouth: "Mouth", passage: "Passage", passages: "passages" },
  gasket: { deck: "Gasket outline", mouth: "Bore", passage: "Port", passages: "ports" },
} as const;

export function PhotoTrace({ onApply, caseId = null, units = "mm", shapesFor = "case", initialReference, onReferenceChange, onPhotoChosen }: Props) {
  const words = WORDS[shapesFor];
  const [photo, setPhoto] = useState<Photo | null>(null);
  const [photoNotice, setPhotoNotice] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  // A chosen photo being decoded: the surface still shows the one before, and takes no clicks meanwhile.
  const [decoding, setDecoding] = useState(false);
  // Each photo asked for (the stored one on opening, or a chosen file) takes a turn; a late answer to an
  // earlier turn never replaces the photo asked for after it.
  const photoTurn = useRef(0);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const fileRef = useRef<HTMLInputElement>(null);

  const [mode, setMode] = useState<Mode>("rectangle");
  const [refPx, setRefPx] = useState<Point[]>([]);
  const [acrossText, setAcrossText] = useState("");
  const [alongText, setAlongText] = useState("");
  const [distanceText, setDistanceText] = useState("");
  const [studsFromRef, setStudsFromRef] = useState(true);

  const [step, setStep] = useState<"reference" | "trace">("reference");
  const [target, setTarget] = useState<Target>("deck");
  const [studs, setStuds] = useState<Point[]>([]);
  const [deck, setDeck] = useState<Point[]>([]);
  const [mouth, setMouth] = useState<Point[]>([]);
  const [mouthRound, setMouthRound] = useState(true);
  const [passages, setPassages] = useState<Point[][]>([]);
  const [cursor, setCursor] = useState<Point | null>(null);
  const [applied, setApplied] = useState<string | null>(null);

  // ——— the photo ———

  // The decoded picture waits here until the canvas for it is on the page, then is drawn at display size.
  const picture = useRef<CanvasImageSource | null>(null);
  useLayoutEffect(() => {
    const canvas = canvasRef.current;
    const source = picture.current;
    if (!canvas || !source || !photo) return;
    const k = Math.min(1, DISPLAY_MAX_PX / Math.max(photo.widthPx, photo.heightPx));
    canvas.width = Math.round(photo.widthPx * k);
    canvas.height = Math.round(photo.heightPx * k);
    canvas.getContext("2d")?.drawImage(source, 0, 0, canvas.width, canvas.height);
  }, [photo]);

  const showStored = useCallback((item: { id: string; url: string | null }, turn: number) => {
    if (!item.url) return;
    const img = new Image();
    img.onload = () => {
      if (turn !== photoTurn.current) return;
      picture.current = img;
      setPhoto({ src: item.url!, widthPx: img.naturalWidth, heightPx: img.naturalHeight, storedId: item.id });
    };
    img.onerror = () => {
      if (turn === photoTurn.current) setPhotoNotice({ tone: "error", text: "The stored photo could not be shown; upload it again." });
    };
    img.src = item.url;
  }, []);

  useEffect(() => {
    if (!caseId) return;
    let live = true;
    const turn = photoTurn.current;
    void callApi<{ items: { id: string; state: string; url: string | null; widthPx: number | null; heightPx: number | null }[] }>(`/api/v1/cases/${caseId}/photos`).then((res) => {
      if (!live || turn !== photoTurn.current) return;
      if (!res.ok) {
        if (res.status !== 404) setPhotoNotice({ tone: "error", text: res.error.message });
        return;
      }
      const latest = res.data.items.find((p) => p.state === "ready");
      if (latest) showStored(latest, turn);
    });
    return () => {
      live = false;
    };
  }, [caseId, showStored]);

  async function choose(file: File | undefined) {
    setPhotoNotice(null);
    if (!file) return;
    const turn = ++photoTurn.current;
    setDecoding(true);
    const head = new Uint8Array(await file.slice(0, 16).arrayBuffer());
    const problem = photoProblem(file.size, sniffPhotoType(head));
    if (problem) {
      if (turn !== photoTurn.current) return;
      setDecoding(false);
      setPhotoNotice({ tone: "error", text: `${problem} Nothing was saved.` });
      if (fileRef.current) fileRef.current.value = "";
      return;
    }
    let bitmap: ImageBitmap;
    try {
      // Turned upright by its EXIF orientation, as the camera meant it.
      bitmap = await createImageBitmap(file, { imageOrientation: "from-image" });
    } catch {
      if (turn !== photoTurn.current) return;
      setDecoding(false);
      setPhotoNotice({ tone: "error", text: "The file could not be read as an image (it may be damaged). Nothing was saved." });
      return;
    }
    if (turn !== photoTurn.current) {
      bitmap.close();
      return;
    }
    setDecoding(false);
    const width = bitmap.width;
    const height = bitmap.height;
    if (picture.current instanceof ImageBitmap) picture.current.close();
    picture.current = bitmap;
    setPhoto({ src: "", widthPx: width, heightPx: height, storedId: null });
    resetTrace();
    if (!caseId) {
      onPhotoChosen?.({ file, contentType: sniffPhotoType(head)!, widthPx: width, heightPx: height });
      const keep = onPhotoChosen ? "It is kept with the case profile when you save it." : "Save the case profile to keep a photo with it.";
      setPhotoNotice({ tone: "ok", text: `Photo shown for tracing. ${keep}` });
      return;
    }
    setBusy(true);
    const stored = await store(caseId, file, sniffPhotoType(head)!, width, height);
    setBusy(false);
    // A photo chosen meanwhile is the one on show now; this one's outcome is no longer news.
    if (turn !== photoTurn.current) return;
    if (!stored.ok) setPhotoNotice({ tone: "error", text: `${stored.message} The photo is shown for tracing but was not kept.` });
    else {
      setPhoto((p) => (p ? { ...p, storedId: stored.id } : p));
      setPhotoNotice({ tone: "ok", text: "Photo kept with the case profile (shop only; customers never see it)." });
    }
  }

  function resetTrace() {
    setRefPx([]);
    setStuds([]);
    setDeck([]);
    setMouth([]);
    setPassages([]);
    setStep("reference");
    setApplied(null);
  }

  // ——— the reference ———

  const across = parseLengthText(acrossText, units);
  const along = parseLengthText(alongText, units);
  const distance = parseLengthText(distanceText, units);
  // A kept length stays exact while its field still shows it as restored (inch text rounds to 0.001 in).
  const [kept, setKept] = useState<{ across?: number; along?: number; distance?: number }>({});
  const exact = (text: string, parsed: typeof across, keptMm: number | undefined) =>
    keptMm !== undefined && text === lengthFieldText(keptMm, units) ? keptMm : parsed.ok ? parsed.value : undefined;
  const acrossMm = exact(acrossText, across, kept.across);
  const alongMm = exact(alongText, along, kept.along);
  const distanceMm = exact(distanceText, distance, kept.distance);
  const need = mode === "rectangle" ? 4 : 2;

  const reference = useMemo((): { map: PhotoToMm; summary: string; fits: boolean } | { error: string } | null => {
    if (!photo || refPx.length < need) return null;
    try {
      if (mode === "rectangle") {
        if (acrossMm === undefined || alongMm === undefined) return null;
        const fit = rectangleFit(refPx, acrossMm, alongMm, { width: photo.widthPx, height: photo.heightPx }, (mm) => lengthLabel(mm, units));
        return { map: fit.map, summary: fit.summary, fits: fit.fits };
      }
      if (distanceMm === undefined) return null;
      return { map: twoPointScale(refPx[0], refPx[1], distanceMm), summary: `Scale set: ${lengthLabel(distanceMm, units)} between the two points.`, fits: true };
    } catch (error) {
      if (error instanceof ReferencePointsError) return { error: error.message };
      throw error;
    }
  }, [photo, refPx, need, mode, acrossMm, alongMm, distanceMm, units]);
  const map = reference && "map" in reference ? reference.map : null;

  // The reference as kept with the photo: restored from what was kept (when that changes), reported when it changes.
  const restoredKey = JSON.stringify(initialReference ?? null);
  const [restored, setRestored] = useState("null");
  const reported = useRef(restoredKey);
  const restoredSeen = useRef(restoredKey);
  if (restored !== restoredKey) {
    setRestored(restoredKey);
    if (initialReference) restore(initialReference);
  }
  function restore(ref: PhotoReference) {
    setKept(ref.kind === "rectangle" ? { across: ref.widthMm, along: ref.heightMm } : { distance: ref.distanceMm });
    if (ref.kind === "rectangle") {
      setMode("rectangle");
      setAcrossText(lengthFieldText(ref.widthMm, units));
      setAlongText(lengthFieldText(ref.heightMm, units));
    } else {
      setMode("two-point");
      setDistanceText(lengthFieldText(ref.distanceMm, units));
    }
    setRefPx(ref.points);
    setStep("trace");
  }
  const current = useMemo((): PhotoReference | null => {
    if (!map) return null;
    const pts = refPx.map((p): [number, number] => [p[0], p[1]]);
    if (mode === "rectangle" && pts.length === 4 && acrossMm !== undefined && alongMm !== undefined)
      return { kind: "rectangle", points: [pts[0], pts[1], pts[2], pts[3]], widthMm: acrossMm, heightMm: alongMm };
    if (mode === "two-point" && pts.length === 2 && distanceMm !== undefined) return { kind: "scale", points: [pts[0], pts[1]], distanceMm };
    return null;
  }, [map, refPx, mode, acrossMm, alongMm, distanceMm]);
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

  // ——— clicks ———

  function place(p: Point) {
    setApplied(null);
    if (step === "reference") {
      setRefPx((r) => (r.length >= need ? r : [...r, p]));
      return;
    }
    if (target === "studs") setStuds((s) => [...s, p]);
    else if (target === "deck") setDeck((s) => [...s, p]);
    else if (target === "mouth") setMouth((s) => (mouthRound && s.length >= 3 ? s : [...s, p]));
    else {
      const i = Number(target.slice("passage-".length));
      setPassages((all) => all.map((s, k) => (k === i ? [...s, p] : s)));
    }
  }

  function toPhotoPx(e: PointerEvent<HTMLElement>): Point | null {
    if (!photo) return null;
    const box = e.currentTarget.getBoundingClientRect();
    return [((e.clientX - box.left) / box.width) * photo.widthPx, ((e.clientY - box.top) / box.height) * photo.heightPx];
  }

  function onKey(e: KeyboardEvent<HTMLDivElement>) {
    if (!photo || decoding) return;
    const stepPx = (e.shiftKey ? 10 : 1) * Math.max(1, Math.max(photo.widthPx, photo.heightPx) / 400);
    const c = cursor ?? [photo.widthPx / 2, photo.heightPx / 2];
    const moves: Record<string, Point> = { ArrowLeft: [-stepPx, 0], ArrowRight: [stepPx, 0], ArrowUp: [0, -stepPx], ArrowDown: [0, stepPx] };
    if (moves[e.key]) {
      e.preventDefault();
      setCursor([Math.min(photo.widthPx, Math.max(0, c[0] + moves[e.key][0])), Math.min(photo.heightPx, Math.max(0, c[1] + moves[e.key][1]))]);
    } else if (e.key === "Enter" || e.key === " ") {
      e.preventDefault();
      place(c);
      setCursor(c);
    }
  }

  function undoPoint() {
    setApplied(null);
    if (step === "reference") setRefPx((r) => r.slice(0, -1));
    else if (target === "studs") setStuds((s) => s.slice(0, -1));
    else if (target === "deck") setDeck((s) => s.slice(0, -1));
    else if (target === "mouth") setMouth((s) => s.slice(0, -1));
    else {
      const i = Number(target.slice("passage-".length));
      setPassages((all) => all.map((s, k) => (k === i ? s.slice(0, -1) : s)));
    }
  }

  // ——— shapes in mm ———

  const traced = useMemo(() => {
    if (!map) return null;
    const mm = (p: Point): [number, number] => {
      const [x, y] = pxToMm(map, p);
      return [Math.round(x * 1000) / 1000, Math.round(y * 1000) / 1000];
    };
    const polygon = (pts: Point[], what: string): { outline?: Outline; problem?: string } => {
      if (pts.length === 0) return {};
      if (pts.length < 3) return { problem: `The ${what} needs at least three corners (${pts.length} so far).` };
      const parsed = OutlineSchema.safeParse({ kind: "polygon", pointsMm: pts.map(mm) });
      return parsed.success ? { outline: parsed.data } : { problem: `The ${what}: ${parsed.error.issues[0]?.message ?? "not a valid outline"}.` };
    };
    const studPx = [...(mode === "rectangle" && studsFromRef ? refPx : []), ...studs];
    const studList = studPx.map((p, i) => ({ label: `S${i + 1}`, positionMm: mm(p) }));
    const deckShape = polygon(deck, words.deck.toLowerCase());
    let mouthShape: { outline?: Outline; problem?: string } = {};
    if (mouthRound && mouth.length > 0) {
      if (mouth.length < 3) mouthShape = { problem: `Click three points on the ${words.mouth.toLowerCase()}'s edge (${mouth.length} so far).` };
      else {
        const c = circleThrough(mm(mouth[0]), mm(mouth[1]), mm(mouth[2]));
        mouthShape = c ? { outline: { kind: "circle", diameterMm: Math.round(c.diameterMm * 1000) / 1000, centerMm: c.centerMm } } : { problem: `The three ${words.mouth.toLowerCase()} points lie on one line; click them spread around the edge.` };
      }
    } else mouthShape = polygon(mouth, words.mouth.toLowerCase());
    const passageShapes = passages.map((p, i) => ({ label: `${words.passage} ${i + 1}`, ...polygon(p, `${words.passage.toLowerCase()} ${i + 1}`) }));
    const problems = [deckShape.problem, mouthShape.problem, ...passageShapes.map((p) => p.problem)].filter((p): p is string => Boolean(p));
    const shapes: CapturedShapes = {};
    if (deckShape.outline) shapes.deck = deckShape.outline;
    if (mouthShape.outline) shapes.mouth = mouthShape.outline;
    if (studList.length) shapes.studs = studList;
    const pockets = passageShapes.flatMap((p) => (p.outline ? [{ label: p.label, outline: p.outline }] : []));
    if (pockets.length) shapes[shapesFor === "gasket" ? "ports" : "pockets"] = pockets;
    return { shapes, problems, deckBad: Boolean(deckShape.problem), mouthBad: Boolean(mouthShape.problem), passageBad: passageShapes.map((p) => Boolean(p.problem)) };
  }, [map, mode, studsFromRef, refPx, studs, deck, mouth, mouthRound, passages, shapesFor, words]);

  const nothingTraced = !traced || Object.keys(traced.shapes).length === 0;

  function apply() {
    if (!traced || traced.problems.length || nothingTraced) return;
    onApply(traced.shapes);
    const windows = traced.shapes.pockets ?? traced.shapes.ports;
    const parts = [traced.shapes.deck ? `the ${words.deck.toLowerCase()}` : null, traced.shapes.mouth ? `the ${words.mouth.toLowerCase()}` : null, traced.shapes.studs ? `${traced.shapes.studs.length} studs` : null, windows ? `${windows.length} ${words.passages}` : null].filter(Boolean);
    setApplied(`Put into the form: ${parts.join(", ")}.`);
  }

  // ——— drawing ———

  const refRing = useMemo(() => {
    if (refPx.length !== 4) return refPx;
    try {
      return orderAsRectangle(refPx);
    } catch {
      return refPx;
    }
  }, [refPx]);

  const r = photo ? Math.max(photo.widthPx, photo.heightPx) / 160 : 4;
  const stroke = photo ? Math.max(photo.widthPx, photo.heightPx) / 500 : 2;
  const ring = (pts: Point[], color: string, closed: boolean, key: string) =>
    pts.length > 1 ? (
      closed && pts.length > 2 ? (
        <polygon key={key} points={pts.map((p) => p.join(",")).join(" ")} fill="none" stroke={color} strokeWidth={stroke} />
      ) : (
        <polyline key={key} points={pts.map((p) => p.join(",")).join(" ")} fill="none" stroke={color} strokeWidth={stroke} />
      )
    ) : null;
  const dots = (pts: Point[], color: string, key: string, labels = false) =>
    pts.map((p, i) => (
      <g key={`${key}-${i}`}>
        <circle cx={p[0]} cy={p[1]} r={r} fill="none" stroke={color} strokeWidth={stroke} />
        <line x1={p[0] - r * 1.6} y1={p[1]} x2={p[0] + r * 1.6} y2={p[1]} stroke={color} strokeWidth={stroke / 2} />
        <line x1={p[0]} y1={p[1] - r * 1.6} x2={p[0]} y2={p[1] + r * 1.6} stroke={color} strokeWidth={stroke / 2} />
        {labels ? (
          <text x={p[0] + r * 1.8} y={p[1] - r * 1.2} fontSize={r * 2.6} fill={color} stroke="white" strokeWidth={stroke / 2} paintOrder="stroke">
            {i + 1}
          </text>
        ) : null}
      </g>
    ));
  const ok = "var(--color-accent)";
  const ready = photo !== null && !decoding;
  const placed = step === "reference" ? refPx : target === "studs" ? studs : target === "deck" ? deck : target === "mouth" ? mouth : (passages[Number(target.slice("passage-".length))] ?? []);
  const bad = "var(--color-interfere)";

  const targetWords: Record<string, string> = { studs: "Studs", deck: `${words.deck} corners`, mouth: mouthRound ? `${words.mouth} (three points on its edge)` : `${words.mouth} corners` };
  const prompt =
    step === "reference"
      ? mode === "rectangle"
        ? `Click the centres of the four studs (${refPx.length} of 4).`
        : `Click the two points whose distance you measured (${refPx.length} of 2).`
      : `Click to add: ${target.startsWith("passage-") ? `${words.passage} ${Number(target.slice(8)) + 1} corners` : targetWords[target]}.`;

  return (
    <section className="card flex flex-col gap-4 p-4" aria-label="Trace from a photo">
      <div>
        <h2 className="text-lg font-semibold">Trace from a photo</h2>
        <p className="text-sm text-ink-2">
          Photograph the deck from above, roughly square on, with the whole stud pattern in view. Measure the stud spacing with calipers; the photo is
          squared up from the four studs, then click the outlines. Check every traced figure against the part before cutting.
        </p>
      </div>

      <div>
        <label htmlFor="trace-photo-file" className="field-label">
          Photo of the deck (JPEG, PNG or WebP, up to {MAX_PHOTO_MB} MB)
        </label>
        <input
          id="trace-photo-file"
          ref={fileRef}
          type="file"
          accept="image/jpeg,image/png,image/webp"
          className="mt-1 text-sm"
          disabled={busy}
          aria-describedby={photoNotice ? "trace-photo-notice" : undefined}
          onChange={(e) => void choose(e.target.files?.[0])}
        />
        {decoding ? <p className="field-hint" role="status">Reading the photo…</p> : busy ? <p className="field-hint" role="status">Keeping the photo with the case profile…</p> : null}
        {photoNotice ? (
          <div id="trace-photo-notice" className="mt-2">
            <FormNotice tone={photoNotice.tone}>{photoNotice.text}</FormNotice>
          </div>
        ) : null}
      </div>

      {photo ? (
        <>
          <fieldset className="flex flex-col gap-3">
            <legend className="field-label">1. Scale and perspective</legend>
            <div className="flex flex-wrap gap-4 text-sm" role="radiogroup" aria-label="How the scale is set">
              <label className="flex items-center gap-1">
                <input type="radio" name="trace-mode" checked={mode === "rectangle"} onChange={() => { setMode("rectangle"); setRefPx([]); setStep("reference"); }} /> Four studs of a measured pattern (squares up the photo)
              </label>
              <label className="flex items-center gap-1">
                <input type="radio" name="trace-mode" checked={mode === "two-point"} onChange={() => { setMode("two-point"); setRefPx([]); setStep("reference"); }} /> Two points and their distance (photo taken square on)
              </label>
            </div>
            <div className="flex flex-wrap items-start gap-4">
              {mode === "rectangle" ? (
                <>
                  <LengthInput id="trace-across" label="Stud spacing across (x)" units={units} value={acrossText} onChange={setAcrossText} parse={across} />
                  <LengthInput id="trace-along" label="Stud spacing along (y)" units={units} value={alongText} onChange={setAlongText} parse={along} />
                  <label className="flex items-center gap-1 self-end pb-2 text-sm">
                    <input type="checkbox" checked={studsFromRef} onChange={(e) => setStudsFromRef(e.target.checked)} /> the four points are the case&apos;s studs
                  </label>
                </>
              ) : (
                <LengthInput id="trace-distance" label="Measured distance between the two points" units={units} value={distanceText} onChange={setDistanceText} parse={distance} hint="The origin goes midway between them: two studs across the diagonal put it on the cylinder axis." />
              )}
            </div>
            {reference && "error" in reference ? (
              <p className="field-error" role="alert">{reference.error}</p>
            ) : reference ? (
              <div className={reference.fits ? "text-sm text-clear" : "caution"} role="status" data-testid="trace-fit">
                {reference.summary}
              </div>
            ) : null}
            {mode === "rectangle" ? <p className="field-hint">The origin is the centre of the four studs, x across and y along the pattern as they appear in the photo.</p> : null}
          </fieldset>

          <fieldset className="flex flex-col gap-2" disabled={!map}>
            <legend className="field-label">2. Trace</legend>
            <div className="flex flex-wrap items-center gap-2 text-sm">
              <button type="button" className={step === "reference" ? "btn" : "btn-quiet"} onClick={() => setStep("reference")} aria-pressed={step === "reference"}>
                Reference points
              </button>
              {(["studs", "deck", "mouth"] as const).map((t) => (
                <button key={t} type="button" className={step === "trace" && target === t ? "btn" : "btn-quiet"} aria-pressed={step === "trace" && target === t} onClick={() => { setStep("trace"); setTarget(t); }}>
                  {t === "studs" ? "Studs" : t === "deck" ? words.deck : words.mouth}
                </button>
              ))}
              {passages.map((_, i) => (
                <button key={i} type="button" className={step === "trace" && target === `passage-${i}` ? "btn" : "btn-quiet"} aria-pressed={step === "trace" && target === `passage-${i}`} onClick={() => { setStep("trace"); setTarget(`passage-${i}`); }}>
                  {words.passage} {i + 1}
                </button>
              ))}
              <button type="button" className="btn-quiet" onClick={() => { setPassages((p) => [...p, []]); setStep("trace"); setTarget(`passage-${passages.length}`); }}>
                Add a {words.passage.toLowerCase()}
              </button>
              <label className="flex items-center gap-1">
                <input type="checkbox" checked={mouthRound} onChange={(e) => { setMouthRound(e.target.checked); setMouth([]); }} /> round {words.mouth.toLowerCase()}
              </label>
            </div>
          </fieldset>

          <p className="text-sm" aria-live="polite" data-testid="trace-prompt">{prompt}</p>
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn-quiet" onClick={undoPoint}>Remove the last point</button>
            <button type="button" className="btn-quiet" onClick={resetTrace}>Start over</button>
          </div>

          <div
            className="relative w-full max-w-full cursor-crosshair touch-none select-none"
            style={{ aspectRatio: `${photo.widthPx} / ${photo.heightPx}` }}
            role="application"
            aria-label="Photo to click on. Arrow keys move the marker (Shift for bigger steps), Enter places a point."
            tabIndex={0}
            data-testid="trace-surface"
            data-photo-width={photo.widthPx}
            data-photo-height={photo.heightPx}
            data-ready={ready}
            data-points={placed.length}
            aria-busy={!ready}
            onPointerDown={(e) => {
              if (e.button !== 0 || !ready) return;
              const p = toPhotoPx(e);
              if (p) place(p);
            }}
            onKeyDown={onKey}
          >
            <canvas ref={canvasRef} className="absolute inset-0 h-full w-full" aria-hidden="true" />
            <svg className="pointer-events-none absolute inset-0 h-full w-full" viewBox={`0 0 ${photo.widthPx} ${photo.heightPx}`} preserveAspectRatio="none" aria-hidden="true">
              {ring(mode === "rectangle" ? refRing : refPx, "var(--color-tight)", mode === "rectangle", "ref")}
              {dots(refPx, "var(--color-tight)", "ref", true)}
              {dots(studs, ok, "stud")}
              {ring(deck, traced?.deckBad ? bad : ok, true, "deck")}
              {dots(deck, traced?.deckBad ? bad : ok, "deck")}
              {mouthRound ? null : ring(mouth, traced?.mouthBad ? bad : ok, true, "mouth")}
              {dots(mouth, traced?.mouthBad ? bad : ok, "mouth")}
              {passages.map((p, i) => ring(p, traced?.passageBad[i] ? bad : ok, true, `passage-${i}`))}
              {passages.map((p, i) => dots(p, traced?.passageBad[i] ? bad : ok, `pd-${i}`))}
              {cursor ? dots([cursor], "var(--color-ink)", "cursor") : null}
            </svg>
          </div>

          {traced ? <TracedReadout shapes={traced.shapes} units={units} words={words} /> : null}
          {traced?.problems.length ? (
            <ul className="text-sm text-interfere" role="alert">
              {traced.problems.map((p) => (
                <li key={p}>{p} Not put into the form until it is fixed.</li>
              ))}
            </ul>
          ) : null}
          <div className="flex flex-wrap items-center gap-3">
            <button type="button" className="btn" onClick={apply} disabled={!traced || nothingTraced || traced.problems.length > 0}>
              Put the traced shapes into the form
            </button>
            {applied ? <span role="status" className="text-sm text-clear">{applied}</span> : null}
          </div>
        </>
      ) : null}
    </section>
  );
}

function LengthInput(props: { id: string; label: string; units: LengthUnits; value: string; onChange: (v: string) => void; parse: ReturnType<typeof parseLengthText>; hint?: string }) {
  const error = !props.parse.ok ? props.parse.message : props.parse.value !== undefined && props.parse.value <= 0 ? "must be more than zero" : undefined;
  return (
    <div className="w-56">
      <label htmlFor={props.id} className="field-label">
        {props.label} <span className="text-ink-2 num">({props.units})</span>
      </label>
      <input id={props.id} className="field-input num" inputMode="decimal" value={props.value} onChange={(e) => props.onChange(e.target.value)} aria-invalid={error ? true : undefined} aria-describedby={error ? `${props.id}-error` : props.hint ? `${props.id}-hint` : undefined} />
      {error ? <p id={`${props.id}-error`} className="field-error" role="alert">{error}</p> : props.hint ? <p id={`${props.id}-hint`} className="field-hint">{props.hint}</p> : null}
    </div>
  );
}

function TracedReadout({ shapes, units, words }: { shapes: CapturedShapes; units: LengthUnits; words: (typeof WORDS)[keyof typeof WORDS] }) {
  const pt = (p: readonly [number, number]) => `${lengthLabel(p[0], units)}, ${lengthLabel(p[1], units)}`;
  const outline = (o: Outline) => (o.kind === "circle" ? `circle Ø ${lengthLabel(o.diameterMm, units)} at ${pt(o.centerMm ?? [0, 0])}` : o.pointsMm.map(pt).join("; "));
  return (
    <div className="text-sm" data-testid="trace-readout" data-shapes={JSON.stringify(shapes)}>
      <h3 className="font-medium">Traced, in {units}</h3>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-3 gap-y-1">
        {shapes.studs ? (
          <>
            <dt>Studs</dt>
            <dd className="num">{shapes.studs.map((s) => `${s.label} (${pt(s.positionMm)})`).join("; ")}</dd>
          </>
        ) : null}
        {shapes.deck ? (
          <>
            <dt>{words.deck}</dt>
            <dd className="num">{outline(shapes.deck)}</dd>
          </>
        ) : null}
        {shapes.mouth ? (
          <>
            <dt>{words.mouth}</dt>
            <dd className="num">{outline(shapes.mouth)}</dd>
          </>
        ) : null}
        {(shapes.pockets ?? shapes.ports)?.map((p) => (
          <div key={p.label} className="contents">
            <dt>{p.label}</dt>
            <dd className="num">{outline(p.outline)}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}

/** Keeps the photo with the case profile: a presigned upload straight to storage, then the server checks it. */
async function store(caseId: string, file: File, contentType: string, widthPx: number, heightPx: number): Promise<{ ok: true; id: string } | { ok: false; message: string }> {
  const start = await callApi<{ id: string; uploadUrl: string; headers: Record<string, string> }>(`/api/v1/cases/${caseId}/photos`, {
    body: { contentType, sizeBytes: file.size, widthPx, heightPx },
  });
  if (!start.ok) return { ok: false, message: start.error.fields?.contentType ?? start.error.fields?.sizeBytes ?? start.error.message };
  let put: Response;
  try {
    put = await fetch(start.data.uploadUrl, { method: "PUT", headers: start.data.headers, body: file });
  } catch {
    return { ok: false, message: "The photo store could not be reached." };
  }
  if (!put.ok) return { ok: false, message: `The photo store refused the upload (${put.status}).` };
  const done = await callApi(`/api/v1/cases/${caseId}/photos/${start.data.id}/complete`, { body: {} });
  if (!done.ok) return { ok: false, message: done.error.message };
  return { ok: true, id: start.data.id };
}
