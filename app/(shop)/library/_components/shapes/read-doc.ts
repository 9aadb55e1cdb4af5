import type { LengthUnits } from "@/geometry";
import { shapeIssues, type ShapeIssue } from "@/geometry/shapes";
import type { EditShapes } from "@/scene/drawing/plan-edit";
import { parseLengthText } from "@/model/units";
import type { StudText } from "@/app/_ui/form/text-values";
import { readOutlineText, type ShapeDoc } from "./shape-store";

/** What the drawing needs from outside the store: the mouth's diameter from its readings, the stud hole. */
export type DocExtras = {
  mouthDiameterMm: number | null;
  studHoleDiameterMm: number | null;
  /** Studs kept by the form rather than the store (a kit's studs), drawn but not dragged here. */
  studs?: StudText[];
};

const mm = (t: string, units: LengthUnits) => {
  const r = parseLengthText(t, units);
  return r.ok && r.value !== undefined ? r.value : null;
};

/** The store's texts as shapes in mm; a shape that cannot be read yet is null. */
export function docShapes(doc: ShapeDoc, units: LengthUnits, x: DocExtras): EditShapes {
  const studs = (x.studs ?? doc.studs).map((s) => {
    const px = mm(s.positionMm[0], units), py = mm(s.positionMm[1], units);
    return px === null || py === null ? null : { label: s.label, positionMm: [px, py] as [number, number] };
  });
  return {
    deck: readOutlineText(doc.deck, units),
    mouth: readOutlineText(doc.mouth, units, doc.mouth?.kind === "circle" ? x.mouthDiameterMm : undefined),
    studs,
    studHoleDiameterMm: x.studHoleDiameterMm,
    pockets: doc.pockets.map((p) => ({ label: p.label, outline: readOutlineText(p.outline, units), startDepthMm: mm(p.startDepthMm, units) ?? 0 })),
  };
}

/** The problems of the shapes as drawn, in words. */
export function docIssues(s: EditShapes, pocketWord: string): ShapeIssue[] {
  return shapeIssues({ deck: s.deck, mouth: s.mouth, studs: s.studs, pockets: s.pockets.map((p) => p.outline), pocketWord });
}
