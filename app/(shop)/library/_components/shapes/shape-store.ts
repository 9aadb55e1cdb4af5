import type { LengthUnits, Outline } from "@/geometry";
import { mirrorOutline, type Capture, type ShapeOutline, type ShapeParams } from "@/geometry/shapes";
import { temporal } from "zundo";
import { createStore } from "zustand/vanilla";
import type { CapturedShapes } from "@/app/_ui/capture/captured-shapes";
import { fromUnits, lengthFieldText as lengthText, parseLengthText, toUnits } from "@/model/units";
import { emptyOutline, type OutlineText, type PairText, type StudText } from "@/app/_ui/form/text-values";
import { convertLengthTexts } from "@/app/_ui/form/units-text";

// The shapes of a library form — deck, mouth, studs, passages (or a gasket and its ports) — as the
// texts shown in their fields, in the form's units. This store is their one source of truth: the
// fields, the drawing and the gestures all read and write here, the form's validation and save read
// it (react-hook-form keeps the other fields). Every change of the shapes is one step of undo (zundo).

export type PocketText = { label: string; startDepthMm: string; outline: OutlineText };

export type ShapeDoc = {
  /** The deck (or a kit's gasket outline); null when the form has none yet. */
  deck: OutlineText | null;
  /** The mouth opening (its round diameter comes from the readings in the form, not from here). */
  mouth: OutlineText | null;
  studs: StudText[];
  /** Transfer passages and pockets (or a gasket's port windows). */
  pockets: PocketText[];
  /** The measurements a shape was made from, in mm, by shape key. */
  capture: Capture;
};

/** A key of a shape: "deck", "mouth", "pockets.2"; a stud "studs.1". */
export type ShapeKey = string;

export type ShapeState = {
  doc: ShapeDoc;
  units: LengthUnits;
  /** The key under the pointer or in a focused field (highlighted in both the drawing and the fields). */
  hover: string | null;
  /** The point the arrow keys move. */
  selected: string | null;
};

type Point = [number, number];

/** The snap grid of a dragged point: 0.1 mm, or 0.005 in for inch forms. */
export const SNAP = { mm: 0.1, in: 0.005 } as const;

const snapText = (mm: number, units: LengthUnits, snap: boolean) => {
  const v = toUnits(mm, units);
  const s = snap ? Math.round(v / SNAP[units]) * SNAP[units] : v;
  return lengthText(fromUnits(s, units), units);
};

/** A point in mm as texts in the units, snapped to the grid unless `snap` is false. */
export function pointText(p: readonly [number, number], units: LengthUnits, snap = true): PairText {
  return [snapText(p[0], units, snap), snapText(p[1], units, snap)];
}

/** An outline from a capture source or a helper, as texts. */
export function outlineTexts(o: Outline, units: LengthUnits): OutlineText {
  if (o.kind === "circle") return { ...emptyOutline("circle"), diameterMm: lengthText(o.diameterMm, units), centerMm: o.centerMm ? [lengthText(o.centerMm[0], units), lengthText(o.centerMm[1], units)] : ["", ""] };
  return { ...emptyOutline("polygon"), pointsMm: o.pointsMm.map((p) => [lengthText(p[0], units), lengthText(p[1], units)]) };
}

const readMm = (t: string, units: LengthUnits) => {
  const r = parseLengthText(t, units);
  return r.ok && r.value !== undefined ? r.value : null;
};

/** An outline's texts in mm, or null while any of it cannot be read. */
export function readOutlineText(o: OutlineText | null, units: LengthUnits, diameterMm?: number | null): ShapeOutline | null {
  if (!o) return null;
  if (o.kind === "polygon") {
    const pts: Point[] = [];
    for (const p of o.pointsMm) {
      const x = readMm(p[0], units), y = readMm(p[1], units);
      if (x === null || y === null) return null;
      pts.push([x, y]);
    }
    return pts.length ? { kind: "polygon", pointsMm: pts } : null;
  }
  const d = diameterMm === undefined ? readMm(o.diameterMm, units) : diameterMm;
  if (d === null || !(d > 0)) return null;
  const blank = !o.centerMm[0].trim() && !o.centerMm[1].trim();
  const cx = readMm(o.centerMm[0], units), cy = readMm(o.centerMm[1], units);
  if (!blank && (cx === null || cy === null)) return null;
  return { kind: "circle", diameterMm: d, ...(blank ? {} : { centerMm: [cx ?? 0, cy ?? 0] as Point }) };
}

/** The outline texts at a shape key, or null. */
export function outlineAt(doc: ShapeDoc, key: ShapeKey): OutlineText | null {
  if (key === "deck") return doc.deck;
  if (key === "mouth") return doc.mouth;
  const m = /^pockets\.(\d+)$/.exec(key);
  return m ? (doc.pockets[Number(m[1])]?.outline ?? null) : null;
}

/** The doc with the outline at a key replaced; a hand edit drops the measurements it was made from. */
export function withOutline(doc: ShapeDoc, key: ShapeKey, o: OutlineText, params?: ShapeParams | null): ShapeDoc {
  const capture = { ...doc.capture };
  if (params) capture[key] = params;
  else if (params === null) delete capture[key];
  if (key === "deck") return { ...doc, deck: o, capture };
  if (key === "mouth") return { ...doc, mouth: o, capture };
  const i = Number(/^pockets\.(\d+)$/.exec(key)?.[1] ?? -1);
  if (i < 0 || i >= doc.pockets.length) return doc;
  return { ...doc, capture, pockets: doc.pockets.map((p, j) => (j === i ? { ...p, outline: o } : p)) };
}

/** Splits "pockets.1:3" into the shape "pockets.1" and its corner 3. */
export function splitPointKey(key: string): { shape: ShapeKey; index: number | "edge" } | null {
  const m = /^(deck|mouth|pockets\.\d+):(\d+|edge)$/.exec(key);
  if (!m) return null;
  return { shape: m[1], index: m[2] === "edge" ? "edge" : Number(m[2]) };
}

/** Pocket keys move when a pocket is removed: the capture record follows them. */
function reindexCapture(capture: Capture, removed: number): Capture {
  const out: Capture = {};
  for (const [k, v] of Object.entries(capture)) {
    const m = /^pockets\.(\d+)$/.exec(k);
    if (!m) out[k] = v;
    else if (Number(m[1]) < removed) out[k] = v;
    else if (Number(m[1]) > removed) out[`pockets.${Number(m[1]) - 1}`] = v;
  }
  return out;
}

/** The edits of the shapes. Each writes one new doc (one undo step). */
export function shapeActions(get: () => ShapeState, setDoc: (doc: ShapeDoc) => void) {
  const doc = () => get().doc;
  const units = () => get().units;
  return {
    setOutline: (key: ShapeKey, o: OutlineText, params?: ShapeParams | null) => setDoc(withOutline(doc(), key, o, params === undefined ? null : params)),
    /** Moves a corner, a stud or a circle's edge to a point in mm. */
    movePoint: (key: string, atMm: readonly [number, number], snap = true) => {
      const d = doc();
      const stud = /^studs\.(\d+)$/.exec(key);
      if (stud) {
        const i = Number(stud[1]);
        const capture = { ...d.capture };
        delete capture.studs;
        setDoc({ ...d, capture, studs: d.studs.map((s, j) => (j === i ? { ...s, positionMm: pointText(atMm, units(), snap) } : s)) });
        return;
      }
      const k = splitPointKey(key);
      const o = k && outlineAt(d, k.shape);
      if (!k || !o) return;
      if (k.index === "edge") {
        const cx = readMm(o.centerMm[0], units()) ?? 0, cy = readMm(o.centerMm[1], units()) ?? 0;
        const r = Math.hypot(atMm[0] - cx, atMm[1] - cy);
        setDoc(withOutline(d, k.shape, { ...o, diameterMm: snapText(2 * r, units(), snap) }, null));
        return;
      }
      const i = k.index;
      setDoc(withOutline(d, k.shape, { ...o, pointsMm: o.pointsMm.map((p, j) => (j === i ? pointText(atMm, units(), snap) : p)) }, null));
    },
    /** Adds a corner after corner i (on the edge from i to i + 1) at a point in mm. */
    insertCorner: (shape: ShapeKey, after: number, atMm: readonly [number, number], snap = true) => {
      const o = outlineAt(doc(), shape);
      if (!o || o.kind !== "polygon") return;
      const pts = [...o.pointsMm];
      pts.splice(after + 1, 0, pointText(atMm, units(), snap));
      setDoc(withOutline(doc(), shape, { ...o, pointsMm: pts }, null));
    },
    removeCorner: (shape: ShapeKey, index: number) => {
      const o = outlineAt(doc(), shape);
      if (!o || o.kind !== "polygon") return;
      setDoc(withOutline(doc(), shape, { ...o, pointsMm: o.pointsMm.filter((_, j) => j !== index) }, null));
    },
    /** Mirrors a shape across the x axis (y → −y) or the y axis; with `copy`, adds the mirror image as a new pocket instead. */
    mirror: (shape: ShapeKey, axis: "x" | "y", copy = false) => {
      const d = doc();
      const o = outlineAt(d, shape);
      const mm = readOutlineText(o, units());
      if (!o || !mm) return;
      const image = outlineTexts(mirrorOutline(mm, axis), units());
      const pocket = /^pockets\.(\d+)$/.exec(shape);
      if (copy && pocket) {
        const src = d.pockets[Number(pocket[1])];
        setDoc({ ...d, pockets: [...d.pockets, { ...src, label: `${src.label} (mirrored)`.slice(0, 80), outline: image }] });
        return;
      }
      setDoc(withOutline(d, shape, image, null));
    },
    setStuds: (studs: StudText[], params?: ShapeParams | null) => {
      const capture = { ...doc().capture };
      if (params) capture.studs = params;
      else delete capture.studs;
      setDoc({ ...doc(), studs, capture });
    },
    setPocket: (i: number, p: Partial<PocketText>) => setDoc({ ...doc(), pockets: doc().pockets.map((x, j) => (j === i ? { ...x, ...p } : x)) }),
    addPocket: (p: PocketText) => setDoc({ ...doc(), pockets: [...doc().pockets, p] }),
    removePocket: (i: number) => setDoc({ ...doc(), pockets: doc().pockets.filter((_, j) => j !== i), capture: reindexCapture(doc().capture, i) }),
    /** Takes what a photo trace or an imported drawing found: each shape it has replaces the form's. */
    apply: (s: CapturedShapes, pocketWord = "passage") => {
      const u = units();
      let d = doc();
      if (s.deck) d = withOutline(d, "deck", outlineTexts(s.deck, u), null);
      if (s.mouth && d.mouth) d = withOutline(d, "mouth", outlineTexts(s.mouth, u), null);
      if (s.studs) d = { ...d, studs: s.studs.map((x) => ({ label: x.label, positionMm: pointText(x.positionMm, u, false) })) };
      const list = s.pockets ?? s.ports;
      if (list) d = { ...d, pockets: list.map((p, i) => ({ label: p.label || `${pocketWord} ${i + 1}`, startDepthMm: "0", outline: outlineTexts(p.outline, u) })) };
      setDoc(d);
    },
  };
}

export type ShapeActions = ReturnType<typeof shapeActions>;

/** A store of one form's shapes, with undo and redo of every change to them. */
export function createShapeStore(doc: ShapeDoc, units: LengthUnits) {
  const store = createStore<ShapeState & { act: ShapeActions }>()(
    temporal(
      (set, get) => ({
        doc,
        units,
        hover: null,
        selected: null,
        act: shapeActions(get, (next) => set({ doc: next })),
      }),
      { partialize: (s) => ({ doc: s.doc }), equality: (a, b) => a.doc === b.doc, limit: 200 },
    ),
  );
  return store;
}

export type ShapeStore = ReturnType<typeof createShapeStore>;

/** Switches the store's texts (and its history) to other units; what does not parse stays as typed. */
export function switchUnits(store: ShapeStore, to: LengthUnits) {
  const from = store.getState().units;
  if (from === to) return;
  const t = store.temporal.getState();
  t.pause();
  store.setState({ units: to, doc: convertLengthTexts(store.getState().doc, from, to) });
  const conv = (s: Partial<{ doc: ShapeDoc }>) => (s.doc ? { doc: convertLengthTexts(s.doc, from, to) } : s);
  store.temporal.setState({ pastStates: t.pastStates.map(conv), futureStates: t.futureStates.map(conv) });
  t.resume();
}

/**
 * Runs a gesture as one undo step: the doc before it is put back untracked, then the final doc is set
 * tracked, so undo returns to where the drag began.
 */
export function gesture(store: ShapeStore) {
  const before = store.getState().doc;
  store.temporal.getState().pause();
  return {
    end: () => {
      const after = store.getState().doc;
      store.setState({ doc: before });
      store.temporal.getState().resume();
      if (after !== before) store.setState({ doc: after });
    },
  };
}
