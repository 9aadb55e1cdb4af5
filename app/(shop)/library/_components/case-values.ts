import type { LengthUnits } from "@/geometry";
import type { Capture } from "@/geometry/shapes";
import type { CaseRow } from "../../../_ui/query/types";
import type { FormReader } from "@/app/_ui/form/form-reader";
import { lengthFieldText as lengthText, numberFieldText as numberText } from "@/model/units";
import { outlineText, readOutline, readStuds, studsText } from "@/app/_ui/form/read-shapes";
import { emptyOutline, type OutlineText, type StudText } from "@/app/_ui/form/text-values";
import type { ShapeDoc } from "./shapes/shape-store";

export type CaseFormValues = {
  name: string;
  notes: string;
  deck: OutlineText;
  mouth: { outline: OutlineText; depthMm: string };
  /** Mouth diameter readings, for a round mouth: the smallest counts. */
  mouthReadingsMm: string[];
  studs: StudText[];
  studHoleDiameterMm: string;
  studThread: string;
  pockets: { label: string; startDepthMm: string; outline: OutlineText }[];
  stockBoreMm: string;
  strokeMm: string;
  cylinders: string;
  densityGPerCm3: string;
  /** The crank chamber, optional: all three lengths or none. */
  crank: { deckToAxisMm: string; webRadiusMm: string; webSpanMm: string };
  /** The measurements the shapes were drawn from (kept in the shape store, saved with the data). */
  capture?: Capture;
};

/** The shape fields, which the shape store keeps; the rest of the values live in react-hook-form. */
const SHAPE_KEYS = ["deck", "studs", "pockets", "capture"] as const;

/** The case's shapes as the store's first doc (lengths in mm). */
export function caseDoc(v: CaseFormValues, row: CaseRow | null): ShapeDoc {
  return { deck: v.deck, mouth: v.mouth.outline, studs: v.studs, pockets: v.pockets, capture: row?.data.capture ?? {} };
}

/** The values react-hook-form keeps: everything but the shapes. */
export function caseFieldDefaults(v: CaseFormValues): Partial<CaseFormValues> {
  const out: Partial<CaseFormValues> = { ...v, mouth: { depthMm: v.mouth.depthMm } as CaseFormValues["mouth"] };
  for (const k of SHAPE_KEYS) delete out[k];
  return out;
}

/** The form's values with the shapes from the store: what is validated and saved. */
export function mergeCase(v: CaseFormValues, doc: ShapeDoc): CaseFormValues {
  return { ...v, deck: doc.deck ?? emptyOutline(), mouth: { ...v.mouth, outline: doc.mouth ?? emptyOutline() }, studs: doc.studs, pockets: doc.pockets, capture: doc.capture };
}

export function caseDefaults(row: CaseRow | null, units: LengthUnits): CaseFormValues {
  const d = row?.data;
  const readings = row?.mouthReadingsMm?.map((r) => lengthText(r.valueMm, units)) ?? [];
  const mouthOutline = outlineText(d?.mouth.outline, units);
  return {
    name: row?.name ?? "",
    notes: row?.notes ?? "",
    deck: d ? outlineText(d.deck, units) : emptyOutline("circle"),
    mouth: { outline: mouthOutline, depthMm: lengthText(d?.mouth.depthMm, units) },
    mouthReadingsMm: readings.length ? readings : mouthOutline.kind === "circle" && mouthOutline.diameterMm ? [mouthOutline.diameterMm] : [""],
    studs: d ? studsText(d.studs, units) : [],
    studHoleDiameterMm: lengthText(d?.studHoleDiameterMm, units),
    studThread: d?.studThread ?? "",
    pockets: (d?.pockets ?? []).map((p) => ({ label: p.label, startDepthMm: lengthText(p.startDepthMm ?? 0, units), outline: outlineText(p.outline, units) })),
    stockBoreMm: lengthText(d?.stockBoreMm, units),
    strokeMm: lengthText(d?.strokeMm, units),
    cylinders: numberText(d?.cylinders ?? 1),
    densityGPerCm3: numberText(d?.densityGPerCm3),
    crank: {
      deckToAxisMm: lengthText(d?.crank?.deckToAxisMm, units),
      webRadiusMm: lengthText(d?.crank?.webRadiusMm, units),
      webSpanMm: lengthText(d?.crank?.webSpanMm, units),
    },
  };
}

const CRANK_KEYS = ["deckToAxisMm", "webRadiusMm", "webSpanMm"] as const;

/** The crank chamber as the core reads it: all three lengths, or none (then the crank check is left out). */
function readCrank(crank: CaseFormValues["crank"] | undefined, read: FormReader): { deckToAxisMm?: number; webRadiusMm?: number; webSpanMm?: number } | undefined {
  const texts = crank ?? { deckToAxisMm: "", webRadiusMm: "", webSpanMm: "" };
  const filled = CRANK_KEYS.filter((k) => (texts[k] ?? "").trim() !== "");
  if (filled.length === 0) return undefined;
  for (const k of CRANK_KEYS) {
    if (!filled.includes(k)) read.issues.push({ path: ["crank", k], message: "fill in all three crank chamber lengths, or leave all three empty" });
  }
  return Object.fromEntries(CRANK_KEYS.map((k) => [k, read.length(texts[k], ["crank", k])]));
}

/** The round mouth's diameter: the smallest of the readings that can be read (the worst case for the skirt). */
function smallestReading(read: FormReader, texts: string[]): number | undefined {
  const values = read.lengths(texts, ["mouthReadingsMm"]).filter((v) => Number.isFinite(v));
  return values.length ? Math.min(...values) : undefined;
}

/** The form's texts as the core's CaseProfile input. */
export function caseToCore(v: CaseFormValues, read: FormReader): unknown {
  const round = v.mouth.outline.kind === "circle";
  const mouthDiameter = round ? smallestReading(read, v.mouthReadingsMm ?? []) : undefined;
  if (round && (v.mouthReadingsMm ?? []).every((t) => !t.trim())) read.issues.push({ path: ["mouthReadingsMm"], message: "add at least one mouth diameter reading" });
  return {
    name: v.name,
    deck: readOutline(v.deck, ["deck"], read),
    mouth: { outline: readOutline(v.mouth.outline, ["mouth", "outline"], read, mouthDiameter ?? (round ? Number.NaN : undefined)), depthMm: read.length(v.mouth.depthMm, ["mouth", "depthMm"]) },
    studs: readStuds(v.studs, read),
    studHoleDiameterMm: read.length(v.studHoleDiameterMm, ["studHoleDiameterMm"]),
    studThread: read.optionalText(v.studThread),
    pockets: (v.pockets ?? []).map((p, i) => ({
      label: p.label.trim(),
      outline: readOutline(p.outline, ["pockets", i, "outline"], read),
      startDepthMm: read.length(p.startDepthMm, ["pockets", i, "startDepthMm"]) ?? 0,
    })),
    stockBoreMm: read.length(v.stockBoreMm, ["stockBoreMm"]),
    strokeMm: read.length(v.strokeMm, ["strokeMm"]),
    cylinders: read.number(v.cylinders, ["cylinders"]) ?? 1,
    densityGPerCm3: read.number(v.densityGPerCm3, ["densityGPerCm3"]),
    crank: readCrank(v.crank, read),
    ...(v.capture && Object.keys(v.capture).length ? { capture: v.capture } : {}),
  };
}
