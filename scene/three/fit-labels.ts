import type { Float32BufferAttribute, Line, LineBasicMaterial } from "three";
import { FIT, printed, SURFACE } from "@/model/palette";
import { diameterLabel, lengthLabel, signedLengthLabel } from "@/model/units";
import { FLANGE_DRAWN_MM, fitState, flangeRadiusMm, governingClearanceMm } from "../fit";
import { toWorld } from "../solids";
import type { FitSnapshot } from "../store";
import type { Label } from "./label";
import type { ViewState } from "./view";

// The words of the fit view: the skirt, the cut, the thinnest wall (with its mark) and the interference,
// each label beside what it names, written from the core's result for the kit on show.

/** The skirt's colour by clearance band: the palette's (light theme, as the scene is a lit workshop in both themes). */
export const STATE_3D = { interfere: printed(FIT.interfere), tight: printed(FIT.tight), clear: printed(FIT.clear) } as const;
const INK = SURFACE.ink.light;
const LABEL_MM = 4.2;
const LABEL_CUSTOMER_MM = 7.5;

/** The fit view's labels, one per thing named: the skirt, the cut, the thinnest wall and the interference. */
export type FitLabelSet = Readonly<Record<"skirt" | "cut" | "wall" | "hit", Label>>;

/** Writes the labels and pins them to the scene, and places the thinnest-wall mark, for the kit on show; `hitShown` when the interference solid is drawn. */
export function placeLabels(L: FitLabelSet, wallLine: Line, snap: FitSnapshot, v: ViewState, hitShown: boolean) {
  const { result, study } = snap;
  const k = result.kits[snap.kitIndex];
  const size = v.customer ? LABEL_CUSTOMER_MM : LABEL_MM;
  for (const l of Object.values(L)) l.heightMm = size;
  const state = fitState(k, result);
  const Rf = flangeRadiusMm(study.kits[snap.kitIndex], k, study.case.studHoleDiameterMm);
  const c = governingClearanceMm(k);
  L.skirt.set(`${FIT[state].icon} skirt ${diameterLabel(k.skirt.diameterMm, v.units)} · ${c < 0 ? "interference" : "clearance"} ${signedLengthLabel(c, v.units)}`, STATE_3D[state]);
  L.skirt.anchor.set(...toWorld(-Rf, Rf * 0.6, -k.skirt.gasketMm - FLANGE_DRAWN_MM - size * 1.2));
  L.cut.visible = k.cut !== null;
  if (k.cut) {
    L.cut.set(`${FIT.counterbore.icon} cut ${diameterLabel(k.cut.diameterMm, v.units)} × ${lengthLabel(k.cut.depthMm, v.units)} deep`, printed(FIT.counterbore));
    L.cut.align = 1;
    L.cut.anchor.set(...toWorld(k.cut.diameterMm / 2 + 4, -k.cut.diameterMm * 0.45, k.cut.depthMm + size));
  }
  const w = k.thinnestWall;
  L.wall.visible = wallLine.visible = w !== null && k.cut !== null;
  if (w && k.cut) {
    const color = w.ok ? INK : printed(FIT.wallLow);
    L.wall.set(`${w.ok ? "" : `${FIT.wallLow.icon} `}thinnest wall ${lengthLabel(w.minWallMm, v.units)} · ${w.label}`, color);
    L.wall.anchor.set(...toWorld(w.atMm[0], w.atMm[1], -size * 0.9));
    const a = wallLine.geometry.getAttribute("position") as Float32BufferAttribute;
    a.setXYZ(0, ...toWorld(w.cutPointMm[0], w.cutPointMm[1], -0.4));
    a.setXYZ(1, ...toWorld(w.atMm[0], w.atMm[1], -0.4));
    a.needsUpdate = true;
    wallLine.geometry.computeBoundingSphere();
    (wallLine.material as LineBasicMaterial).color.set(color);
  }
  const worst = k.interference.vsCut ?? (k.cut ? null : k.interference.vsMouth);
  L.hit.visible = hitShown;
  if (hitShown) {
    const at = worst?.atMm ?? [k.skirt.diameterMm / 2, 0];
    L.hit.set(worst ? `${FIT.interfere.icon} interference ${lengthLabel(worst.deepestMm, v.units)} deep` : "skirt bottoms on the step", STATE_3D.interfere);
    L.hit.anchor.set(...toWorld(at[0] + 3, at[1], Math.min(k.skirt.protrusionMm, study.case.mouth.depthMm) * 0.6));
  }
}
