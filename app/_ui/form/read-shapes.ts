import type { LengthUnits } from "@/geometry";
import type { FormReader, Path } from "./form-reader";
import { lengthFieldText } from "@/model/units";
import type { OutlineText, PairText, StudText } from "./text-values";
import { emptyOutline } from "./text-values";

type Vec = [number, number];
type OutlineIn = { kind: "circle"; diameterMm?: number; centerMm?: Vec } | { kind: "polygon"; pointsMm: Vec[] };

/** A point [x, y] from its texts; NaN stands for an unreadable half so the core reports the field. */
export function readPair(p: PairText | undefined, path: Path, read: FormReader): Vec {
  return [read.length(p?.[0], [...path, 0]) ?? Number.NaN, read.length(p?.[1], [...path, 1]) ?? Number.NaN];
}

/** An outline from its texts, only the fields of its kind (the core's schemas are strict). */
export function readOutline(o: OutlineText, path: Path, read: FormReader, diameterMm?: number): OutlineIn {
  if (o.kind === "polygon") return { kind: "polygon", pointsMm: (o.pointsMm ?? []).map((p, i) => readPair(p, [...path, "pointsMm", i], read)) };
  const blankCentre = !(o.centerMm?.[0] ?? "").trim() && !(o.centerMm?.[1] ?? "").trim();
  return {
    kind: "circle",
    diameterMm: diameterMm ?? read.length(o.diameterMm, [...path, "diameterMm"]),
    ...(blankCentre ? {} : { centerMm: readPair(o.centerMm, [...path, "centerMm"], read) }),
  };
}

export function readStuds(studs: StudText[] | undefined, read: FormReader) {
  return (studs ?? []).map((s, i) => ({ label: s.label.trim(), positionMm: readPair(s.positionMm, ["studs", i, "positionMm"], read) }));
}

type OutlineData = { kind: "circle"; diameterMm: number; centerMm?: readonly [number, number] } | { kind: "polygon"; pointsMm: readonly (readonly [number, number])[] };

/** An outline as texts in the given units. */
export function outlineText(o: OutlineData | undefined, units: LengthUnits): OutlineText {
  if (!o) return emptyOutline();
  const pair = (v: readonly [number, number]): PairText => [lengthFieldText(v[0], units), lengthFieldText(v[1], units)];
  if (o.kind === "polygon") return { ...emptyOutline("polygon"), pointsMm: o.pointsMm.map(pair) };
  return { ...emptyOutline("circle"), diameterMm: lengthFieldText(o.diameterMm, units), centerMm: o.centerMm ? pair(o.centerMm) : ["", ""] };
}

export function studsText(studs: readonly { label: string; positionMm: readonly [number, number] }[] | undefined, units: LengthUnits): StudText[] {
  return (studs ?? []).map((s) => ({ label: s.label, positionMm: [lengthFieldText(s.positionMm[0], units), lengthFieldText(s.positionMm[1], units)] }));
}
